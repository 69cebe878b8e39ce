/**
 * What the design schema says about the field at a path: whether the schema has such a field
 * and, for a physical quantity, its dimension (for parsing values typed on the command line).
 * Walks the zod schema of design/schema.ts through objects, lists, records, unions and the
 * optional/default wrappers.
 */
import { designSchema } from '../design/schema.js';
import { quantityInfo, unwrapSchema } from '../design/quantity-schema.js';
import type { Dimension } from '../units/quantity.js';
import type { PathSegment } from './designPath.js';

export type DesignFieldInfo = { known: false } | { known: true; quantity: false } | { known: true; quantity: true; dimension: Dimension; integer: boolean };

interface ZodNode {
  _zod?: { def: { type: string; shape?: Record<string, unknown>; element?: unknown; valueType?: unknown; options?: unknown[]; in?: unknown } };
}

function child(node: unknown, seg: PathSegment): unknown[] {
  const s = unwrapSchema(node) as ZodNode | undefined;
  const def = s?._zod?.def;
  if (!def) return [];
  switch (def.type) {
    case 'object':
      return typeof seg === 'string' && def.shape && seg in def.shape ? [def.shape[seg]] : [];
    case 'array':
      return typeof seg === 'number' ? [def.element] : [];
    case 'record':
      return typeof seg === 'string' ? [def.valueType] : [];
    case 'union':
      return (def.options ?? []).flatMap((o) => child(o, seg));
    case 'pipe':
      // A section with a preprocessing step: follow its input side.
      return def.in ? child(def.in, seg) : [];
    default:
      return [];
  }
}

/** Schema facts of the field at `segments` in a design file. */
export function designFieldInfo(segments: readonly PathSegment[], schema: unknown = designSchema): DesignFieldInfo {
  let nodes: unknown[] = [schema];
  for (const seg of segments) {
    nodes = nodes.flatMap((n) => child(n, seg));
    if (nodes.length === 0) return { known: false };
  }
  for (const n of nodes) {
    const q = quantityInfo(n);
    if (q) return { known: true, quantity: true, dimension: q.dimension, integer: q.range.integer === true };
  }
  return { known: true, quantity: false };
}
