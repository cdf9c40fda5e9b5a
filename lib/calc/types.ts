/** Public types of the Nodewright calc engine (re-exported from lib/calc/index.ts). */

export interface ModelNote {
  method: string;
  assumptions: string[];
  references: string[];
}

/** 'text': multi-line pasted text (e.g. a CSV table), shown as a text area; 'string': one line. */
export type CalcInputType = 'number' | 'integer' | 'string' | 'text' | 'enum' | 'epoch' | 'record';

export interface CalcInputField {
  name: string;
  label: string;
  /** mathjs unit string like 'km', 'deg', 'kg', 'm^2', 'h', 'd', 's', or null */
  unit: string | null;
  type: CalcInputType;
  default?: unknown;
  min?: number;
  max?: number;
  optional?: boolean;
  options?: string[];
  help?: string;
  /** For 'string' and 'text' fields: the most characters accepted. */
  maxLength?: number;
  /**
   * For an orbital-element input (inclination, RAAN): the reference frame the
   * value must be expressed in. Shown beside the field in the editor and the PDF;
   * the editor offers to convert an EME2000 value through an element-frame block.
   */
  frame?: InputFrame;
  /** For a string input: text of several lines (the editor shows a text area). */
  multiline?: boolean;
}

/** Frames an element input can be expressed in (see topics/reference-frames.ts). */
export type InputFrame = 'EME2000' | 'TOD' | 'TEME';

export interface CalcOutputField {
  name: string;
  label: string;
  unit: string | null;
  /** decimals for display */
  precision: number;
  /** 'vector': an array of numbers in one unit (e.g. a position [x, y, z]) */
  type: 'number' | 'integer' | 'string' | 'boolean' | 'rows' | 'vector';
  columns?: CalcOutputField[];
  /** For rows outputs: 'columns' shows each row as a column (candidates side by side). */
  display?: 'rows' | 'columns';
}

/** Placeholder for figure definitions (plots) a kind may offer later. */
export interface CalcFigureSlot {
  name: string;
  title: string;
  /** output field (type 'rows') the figure draws from */
  rows: string;
  x: string;
  y: string[];
}

export interface CalcKindDescriptor {
  kind: string;
  title: string;
  summary: string;
  inputs: CalcInputField[];
  outputs: CalcOutputField[];
  model: ModelNote;
  figures: CalcFigureSlot[];
  /** Runs in the server's worker pool (see KindDefinition.heavy). */
  heavy: boolean;
  /** For a heavy kind: input name → what to change to make a call cheaper. */
  costInputs?: Record<string, string>;
}

export interface CalcResult {
  kind: string;
  inputs: Record<string, unknown>;
  outputs: Record<string, unknown>;
  warnings: string[];
  model: ModelNote;
  engineVersion: string;
}

export type CalcOutcome =
  { ok: true; result: CalcResult } | { ok: false; error: string; fields: Record<string, string> };

/** A row in a 'rows' output. */
export type OutputRow = Record<string, number | string | boolean>;
export type OutputValue = number | string | boolean | number[] | OutputRow[];

/** What a kind's compute function returns. */
export interface KindComputation {
  outputs: Record<string, OutputValue>;
  warnings: string[];
  /** Sentences about this result's model (e.g. the secular theory used), put first in the result's model assumptions. */
  modelNotes?: string[];
}

/**
 * Thrown inside topic functions when valid-looking input has no solution
 * (e.g. no sun-synchronous inclination exists). Caught by runCalc and turned
 * into { ok: false, fields: { [field]: message } }.
 */
export class CalcInputError extends Error {
  readonly field: string;
  constructor(field: string, message: string) {
    super(message);
    this.name = 'CalcInputError';
    this.field = field;
  }
}
