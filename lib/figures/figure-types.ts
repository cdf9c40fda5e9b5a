import type { TopLevelSpec } from 'vega-lite';
import type { PositionFieldDef } from 'vega-lite/types_unstable/channeldef.js';
import type { LayerSpec, UnitSpec } from 'vega-lite/types_unstable/spec/index.js';
import type { CalcResult } from '@/lib/calc';

/** A complete Vega-Lite specification, ready for vega-lite's compile(). */
export type FigureSpec = TopLevelSpec;

/** One layer of a layered figure. */
export type FigureLayer = LayerSpec<string> | UnitSpec<string>;

/** An x or y encoding of a field. */
export type FigureAxis = PositionFieldDef<string>;

export type FigureOutcome = { ok: true; spec: FigureSpec } | { ok: false; error: string };

/** What the editor and the PDF need to know about a figure kind. */
export interface FigureKindInfo {
  kind: string;
  title: string;
  /** Calc kinds a figure of this kind can be bound to. */
  sourceCalcKinds: string[];
}

export interface FigureKindDefinition extends FigureKindInfo {
  /** Builds the spec from the bound block's engine result (may call runCalc for sweeps). Throws FigureDataError. */
  build(result: CalcResult): FigureSpec;
}

/** The bound result lacks what the figure needs (an output is missing or has the wrong type). */
export class FigureDataError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'FigureDataError';
  }
}
