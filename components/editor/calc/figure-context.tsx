'use client';

import { createContext, useContext, type ReactNode } from 'react';
import type { FigureKindInfo } from '@/lib/figures/figure-types';

interface FigureContextValue {
  memoId: number;
  /** Bumped after every accepted save, so figures (built from the stored memo) refresh. */
  savedVersion: number;
  figureKinds: readonly FigureKindInfo[];
}

const FigureContext = createContext<FigureContextValue | null>(null);

export function FigureContextProvider({ value, children }: { value: FigureContextValue; children: ReactNode }) {
  return <FigureContext.Provider value={value}>{children}</FigureContext.Provider>;
}

export function useFigureContext(): FigureContextValue {
  const ctx = useContext(FigureContext);
  if (!ctx) throw new Error('figures must be rendered inside the memo editor');
  return ctx;
}
