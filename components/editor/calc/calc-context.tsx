'use client';

import { createContext, useContext, useSyncExternalStore, type ReactNode } from 'react';
import type { CalcKindDescriptor } from '@/lib/calc';
import type { BlockState, CalcStore } from './calc-store';

interface CalcContextValue {
  store: CalcStore;
  kinds: ReadonlyMap<string, CalcKindDescriptor>;
  /** False for readers whose role may not run the engine: they see the server's initial results only. */
  canCompute: boolean;
  /** The memo's document number and title: named in exports (OBJECT_ID and OBJECT_NAME of an OPM). */
  memo?: { documentNumber: string; title: string };
}

const CalcContext = createContext<CalcContextValue | null>(null);

export function CalcContextProvider({ value, children }: { value: CalcContextValue; children: ReactNode }) {
  return <CalcContext.Provider value={value}>{children}</CalcContext.Provider>;
}

export function useCalcContext(): CalcContextValue {
  const ctx = useContext(CalcContext);
  if (!ctx) throw new Error('calc blocks must be rendered inside the memo editor');
  return ctx;
}

/** One block's state; re-renders only when that block changes. */
export function useBlockState(blockId: string): BlockState | undefined {
  const { store } = useCalcContext();
  return useSyncExternalStore(
    (l) => store.subscribe(blockId, l),
    () => store.get(blockId),
    () => store.get(blockId),
  );
}

/** The block as it is in the document now (label, kind), or undefined once removed. */
export function usePresentBlock(blockId: string): { label: string; kind: string } | undefined {
  const { store } = useCalcContext();
  return useSyncExternalStore(
    (l) => store.subscribe(blockId, l),
    () => store.block(blockId),
    () => store.block(blockId),
  );
}
