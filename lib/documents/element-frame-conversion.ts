/**
 * "Enter in EME2000" for a calc block whose element inputs are in the frame of
 * date: the plan of an element-frame block to put above it (EME2000 → the
 * block's frame, at the block's epoch when it has one) and the block's new
 * inputs, fed from that block's outputs. Pure: the editor applies it in one step.
 */
import type { CalcKindDescriptor } from '@/lib/calc';
import { FRAME_NAMES } from '@/lib/calc/frame-names';
import { isRef, type CalcBlockAttrs, type InputEntry } from './calc-nodes';

export { FRAME_NAMES };

/** The element inputs the conversion block can feed: its outputs of the same names. */
const CONVERTED_ELEMENTS = ['inclinationDeg', 'raanDeg'] as const;

export interface Eme2000ConversionPlan {
  /** attributes of the new element-frame block */
  converter: CalcBlockAttrs;
  /** the host block's inputs with its element fields fed from the converter */
  hostInputs: Record<string, InputEntry>;
}

function typedText(entry: InputEntry | undefined): string | undefined {
  return entry && !isRef(entry) && entry.text.trim() !== '' ? entry.text : undefined;
}

export function eme2000ConversionFor(
  kind: CalcKindDescriptor,
  host: CalcBlockAttrs,
  converterId: string,
): Eme2000ConversionPlan {
  const elementFields = kind.inputs.filter(
    (f) => f.frame && (CONVERTED_ELEMENTS as readonly string[]).includes(f.name),
  );
  const toFrame = elementFields[0]?.frame ?? 'TOD';
  const inputs: Record<string, InputEntry> = { fromFrame: { text: 'EME2000' }, toFrame: { text: toFrame } };
  // The conversion happens at the host's epoch when it has one (copied: an epoch cannot be fed from a block);
  // otherwise the converter shows its own epoch field for the analyst to set.
  const epochField = kind.inputs.find((f) => f.type === 'epoch');
  const epochText = epochField
    ? (typedText(host.inputs[epochField.name]) ??
      (typeof epochField.default === 'string' ? epochField.default : undefined))
    : undefined;
  if (epochText !== undefined) inputs.epoch = { text: epochText };
  // A value already typed in the host is taken to be the EME2000 value the analyst has in hand.
  for (const f of elementFields) {
    const text = typedText(host.inputs[f.name]);
    if (text !== undefined) inputs[f.name] = { text };
  }
  const hostInputs: Record<string, InputEntry> = { ...host.inputs };
  for (const f of elementFields) hostInputs[f.name] = { ref: { blockId: converterId, output: f.name } };
  const hostName = host.label || kind.title;
  return {
    converter: {
      blockId: converterId,
      kind: 'element-frame',
      label: `${hostName}: elements from EME2000 to ${FRAME_NAMES[toFrame].short}`,
      inputs,
    },
    hostInputs,
  };
}
