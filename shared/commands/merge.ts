// Three-way merges for a save conflict: what this tab started from (base), what it has now (mine)
// and what someone else saved (theirs). Whatever this tab changed wins; everything else is theirs,
// so neither person's change is lost. Lists of things with ids merge item by item.
import { SEEN_LIMITS, type FinishAssignments, type OptionDoc, type Piece, type SeenMark } from '../schemas/option';
import type { Opening, RoomShell } from '../schemas/room';
import { validateRoomShell } from '../geometry/validate';

const same = (a: unknown, b: unknown) => a === b || JSON.stringify(a) === JSON.stringify(b);

function pick<T>(base: T, mine: T, theirs: T): T {
  return same(mine, base) ? theirs : mine;
}

/** Items with keys: mine where this tab added or changed them, gone where this tab removed them, else theirs; theirs' order first. */
function mergeByKey<T>(key: (item: T) => string, base: readonly T[], mine: readonly T[], theirs: readonly T[]): T[] {
  const baseByKey = new Map(base.map((x) => [key(x), x]));
  const mineByKey = new Map(mine.map((x) => [key(x), x]));
  const out: T[] = [];
  for (const t of theirs) {
    const b = baseByKey.get(key(t));
    const m = mineByKey.get(key(t));
    if (b && !m) continue; // this tab removed it
    out.push(m && b && !same(m, b) ? m : m && !b ? m : t);
  }
  const kept = new Set(out.map(key));
  for (const m of mine) if (!kept.has(key(m)) && !baseByKey.has(key(m))) out.push(m); // added here
  return out;
}

/** Items with ids, merged as mergeByKey does. */
function mergeById<T extends { id: string }>(base: readonly T[], mine: readonly T[], theirs: readonly T[]): T[] {
  return mergeByKey((x) => x.id, base, mine, theirs);
}

/** A room shell (plan mm) combining both tabs' changes; falls back to mine when the combination cannot be drawn. */
export function mergeShell(base: RoomShell, mine: RoomShell, theirs: RoomShell): RoomShell {
  const merged: RoomShell = {
    ...theirs,
    wallHeight: pick(base.wallHeight, mine.wallHeight, theirs.wallHeight),
    wallThickness: pick(base.wallThickness, mine.wallThickness, theirs.wallThickness),
    wallThicknesses: pick(base.wallThicknesses, mine.wallThicknesses, theirs.wallThicknesses),
    outline: pick(base.outline, mine.outline, theirs.outline),
    openings: mergeById<Opening>(base.openings, mine.openings, theirs.openings),
    childRoom: pick(base.childRoom, mine.childRoom, theirs.childRoom),
  };
  if (merged.wallThicknesses === undefined) delete merged.wallThicknesses;
  return validateRoomShell(merged).length === 0 ? merged : mine;
}

/** An option document combining both tabs' changes, piece by piece, surface by surface and seen mark by seen mark. */
export function mergeOptionDoc(base: OptionDoc, mine: OptionDoc, theirs: OptionDoc): OptionDoc {
  const finishes: FinishAssignments = {
    floor: pick(base.finishes.floor, mine.finishes.floor, theirs.finishes.floor),
    ceiling: pick(base.finishes.ceiling, mine.finishes.ceiling, theirs.finishes.ceiling),
    walls: pick(base.finishes.walls, mine.finishes.walls, theirs.finishes.walls),
    wallOverrides: { ...theirs.finishes.wallOverrides },
  };
  const keys = new Set([...Object.keys(base.finishes.wallOverrides), ...Object.keys(mine.finishes.wallOverrides)]);
  for (const k of keys) {
    const b = base.finishes.wallOverrides[k];
    const m = mine.finishes.wallOverrides[k];
    if (b === m) continue;
    if (m === undefined) delete finishes.wallOverrides[k];
    else finishes.wallOverrides[k] = m;
  }
  // Seen marks merge finding by finding; past the bound the oldest go, as a new mark pushes them out.
  const seen = mergeByKey<SeenMark>((m) => m.key, base.seen, mine.seen, theirs.seen).slice(-SEEN_LIMITS.marks);
  return { pieces: mergeById<Piece>(base.pieces, mine.pieces, theirs.pieces), finishes, seen };
}
