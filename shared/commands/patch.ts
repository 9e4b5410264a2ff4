// Diffs between two editor documents, found by reference: commands share every part they do not
// change, so the walk stops at the first shared subtree and records only what was touched.
import type { EditorDoc } from './editor-doc';

/** One step down a document: an object key or an array index. */
export type PathKey = string | number;

/** A field's content on one side of a change: absent (the key did not exist) or a value. */
export type Slot = { readonly present: false } | { readonly present: true; readonly value: unknown };

/** One changed place in a document and its content before and after. Paths of one diff never nest. */
export interface Patch {
  readonly path: readonly PathKey[];
  readonly before: Slot;
  readonly after: Slot;
}

const ABSENT: Slot = { present: false };

function isRecord(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

function walk(before: unknown, after: unknown, path: PathKey[], out: Patch[]): void {
  if (Object.is(before, after)) return;
  if (isRecord(before) && isRecord(after)) {
    for (const key of Object.keys(before)) {
      if (Object.hasOwn(after, key)) walk(before[key], after[key], [...path, key], out);
      else out.push({ path: [...path, key], before: { present: true, value: before[key] }, after: ABSENT });
    }
    for (const key of Object.keys(after)) {
      if (!Object.hasOwn(before, key))
        out.push({ path: [...path, key], before: ABSENT, after: { present: true, value: after[key] } });
    }
    return;
  }
  // Arrays of one length are compared place by place; a changed length (a piece added or removed)
  // records the whole array, which still shares every unchanged element.
  if (Array.isArray(before) && Array.isArray(after) && before.length === after.length) {
    before.forEach((item, i) => walk(item, after[i], [...path, i], out));
    return;
  }
  out.push({ path, before: { present: true, value: before }, after: { present: true, value: after } });
}

/** The patches that turn `before` into `after`; empty when they hold the same content. */
export function diffDocs(before: EditorDoc, after: EditorDoc): Patch[] {
  const out: Patch[] = [];
  walk(before, after, [], out);
  return out;
}

function setAt(node: unknown, path: readonly PathKey[], depth: number, slot: Slot): unknown {
  if (depth === path.length) return slot.present ? slot.value : undefined;
  const key = path[depth]!;
  if (Array.isArray(node)) {
    const copy = node.slice();
    copy[key as number] = setAt(node[key as number], path, depth + 1, slot);
    return copy;
  }
  const record = isRecord(node) ? node : {};
  const copy: Record<string, unknown> = { ...record };
  if (depth === path.length - 1 && !slot.present) delete copy[key];
  else copy[String(key)] = setAt(record[key], path, depth + 1, slot);
  return copy;
}

/** Applies patches to a document, putting back each one's `before` (undo) or `after` (redo) side; shares everything else. */
export function applyPatches(doc: EditorDoc, patches: readonly Patch[], side: 'before' | 'after'): EditorDoc {
  // The paths of one diff never nest, so the order does not matter; reversing for undo keeps it
  // correct even for hand-built patch lists that do nest.
  const ordered = side === 'before' ? [...patches].reverse() : patches;
  let node: unknown = doc;
  for (const patch of ordered) node = setAt(node, patch.path, 0, patch[side]);
  // Every patch was recorded from (and replays onto) an EditorDoc, so the result is one again.
  return node as EditorDoc;
}
