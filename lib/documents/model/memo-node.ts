import type { z } from 'zod';
import type { TiptapNode } from '@/lib/memos/memo-schema';
import type { NODE_ATTRIBUTE_SCHEMAS } from './attribute-schemas';
import type { MemoNodeType } from './node-types';

type Mark = NonNullable<TiptapNode['marks']>[number];

/**
 * A stored node of type `T`, its attributes typed by that type's zod schema
 * (as stored: attributes with a default may be left out). Content that
 * reaches a walker has passed validateMemoContent, at save or before a
 * render, so the attribute types hold; walkers still read defensively where
 * a value is optional.
 */
export interface MemoNodeOf<T extends MemoNodeType> {
  type: T;
  attrs?: Partial<z.input<(typeof NODE_ATTRIBUTE_SCHEMAS)[T]>>;
  content?: TiptapNode[];
  marks?: Mark[];
  text?: string;
}

/** Every node a memo may hold, discriminated by `type`. */
export type MemoNode = { [T in MemoNodeType]: MemoNodeOf<T> }[MemoNodeType];
