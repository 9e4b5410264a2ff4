// The outline commands of the room editor: set the outline, move, insert and remove corners,
// re-measure a wall, set wall height and thickness, and close a measured walk that misses its start.
import { closeOutline, outlineFromCorners, type WalkStart, type WalkStep } from '../geometry/outline';
import { CORNER_MARGIN_MM, MIN_WALL_LENGTH_MM, PARALLEL_SINE_TOLERANCE } from '../geometry/tolerances';
import { add, addScaled, cross, dot, normalise, scale, sub } from '../geometry/vec';
import type { Opening, PlanPoint, RoomShell } from '../schemas/room';
import { checkMm, checkNumber, checkSizeMm, checkWall, done, makeCommand, refuse, type Command, type RunResult } from './command';
import type { EditorDoc } from './editor-doc';
import { itemAt } from '../item-at';
import {
  openingWords,
  refitOpenings,
  remapAllWallFinishes,
  remapThicknesses,
  reprojectOffsetMm,
  sourcesAfterRemoval,
  sourcesAfterSplit,
  wallAfterRemoval,
  wallLengthMm,
  type WallSources,
} from './wall-edits';

/** Fewest corners a room outline can have. */
export const MIN_CORNERS = 3;

function identitySources(count: number): WallSources {
  return Array.from({ length: count }, (_, j) => [j]);
}

function checkCorner(shell: RoomShell, index: number): string | null {
  const n = shell.outline.length;
  if (!Number.isInteger(index) || index < 0 || index >= n)
    return `there is no corner ${index} (the room has corners 0 to ${n - 1})`;
  return null;
}

function checkPoints(points: readonly PlanPoint[]): string | null {
  for (const [i, point] of points.entries()) {
    const bad = checkMm(point?.[0], `corner ${i} x`) ?? checkMm(point?.[1], `corner ${i} y`);
    if (bad) return bad;
  }
  return null;
}

// A new outline: openings keep their offsets (slid back to fit). Thickness overrides and wall
// finishes follow `sources` when walls are renumbered; otherwise settings of walls that no longer
// exist are dropped.
function withOutline(
  doc: EditorDoc,
  outline: PlanPoint[],
  openings: readonly Opening[] = doc.shell.openings,
  renumbered?: WallSources,
): RunResult {
  const refitted = refitOpenings(openings, outline);
  if (!refitted.ok) return refuse(refitted.reason);
  const shell: RoomShell = { ...doc.shell, outline, openings: refitted.value };
  const sources = renumbered ?? (outline.length < doc.shell.outline.length ? identitySources(outline.length) : null);
  if (sources === null) return done({ ...doc, shell });
  const wallThicknesses = remapThicknesses(doc.shell.wallThicknesses, sources);
  if (wallThicknesses === undefined) delete shell.wallThicknesses;
  else shell.wallThicknesses = wallThicknesses;
  return done({ shell, options: remapAllWallFinishes(doc.options, sources) });
}

/** Replaces the outline with typed corners (plan mm); a repeated closing corner is dropped. */
export function setOutline(corners: readonly PlanPoint[]): Command {
  return makeCommand(
    'setOutline',
    { corners },
    {
      label: () => 'Redraw outline',
      run: (doc, args) => {
        const bad = checkPoints(args.corners);
        if (bad) return refuse(bad);
        const outline = outlineFromCorners(args.corners);
        if (outline.length < MIN_CORNERS)
          return refuse(`an outline needs at least ${MIN_CORNERS} corners (has ${outline.length})`);
        return withOutline(doc, outline);
      },
    },
  );
}

/** Moves outline corner `index` to (x, y) plan mm; its two walls change, openings keep their offsets. */
export function moveCorner(index: number, x: number, y: number): Command {
  return makeCommand(
    'moveCorner',
    { index, x, y },
    {
      label: (_doc, args) => `Move corner ${args.index}`,
      run: (doc, args) => {
        const bad = checkCorner(doc.shell, args.index) ?? checkMm(args.x, 'x') ?? checkMm(args.y, 'y');
        if (bad) return refuse(bad);
        const outline = doc.shell.outline.map((p, i): PlanPoint => (i === args.index ? [args.x, args.y] : p));
        return withOutline(doc, outline);
      },
    },
  );
}

// The wall that takes up a change of wall `wall`'s length: the first later wall running parallel to
// it, which can lengthen or shorten without any angle changing. Null when no wall is parallel.
function absorbingWall(outline: readonly PlanPoint[], wall: number): number | null {
  const n = outline.length;
  const direction = normalise(sub(itemAt(outline, (wall + 1) % n, 'corner'), itemAt(outline, wall, 'corner')));
  for (let step = 1; step < n; step++) {
    const j = (wall + step) % n;
    const other = normalise(sub(itemAt(outline, (j + 1) % n, 'corner'), itemAt(outline, j, 'corner')));
    if (Math.abs(cross(direction, other)) < PARALLEL_SINE_TOLERANCE) return j;
  }
  return null;
}

/**
 * Re-measures wall `wall` to `lengthMm` (plan mm) keeping its start corner and direction. The later
 * corners move with its end up to the next wall parallel to it, which lengthens or shortens so every
 * angle stays; with no parallel wall, the corners up to the last move and the closing wall (back to
 * corner 0) takes up the change (re-measuring the closing wall moves corner 0 and wall 0 takes it up).
 */
export function setWallLength(wall: number, lengthMm: number): Command {
  return makeCommand(
    'setWallLength',
    { wall, lengthMm },
    {
      label: (_doc, args) => `Change wall ${args.wall} length`,
      run: (doc, args) => {
        const { outline } = doc.shell;
        const n = outline.length;
        const bad = checkWall(doc.shell, args.wall) ?? checkMm(args.lengthMm, 'the length', MIN_WALL_LENGTH_MM);
        if (bad) return refuse(bad);
        const start = itemAt(outline, args.wall, 'corner');
        const direction = normalise(sub(itemAt(outline, (args.wall + 1) % n, 'corner'), start));
        const shift = scale(direction, args.lengthMm - wallLengthMm(outline, args.wall));
        const absorbing = absorbingWall(outline, args.wall);
        const moving = new Set<number>();
        if (absorbing !== null) {
          for (let c = (args.wall + 1) % n; ; c = (c + 1) % n) {
            moving.add(c);
            if (c === absorbing) break;
          }
        } else if (args.wall === n - 1) {
          moving.add(0);
        } else {
          for (let c = args.wall + 1; c < n; c++) moving.add(c);
        }
        const moved = outline.map((p, i): PlanPoint => (moving.has(i) ? add(p, shift) : p));
        if (absorbing !== null) {
          const oldDirection = normalise(
            sub(itemAt(outline, (absorbing + 1) % n, 'corner'), itemAt(outline, absorbing, 'corner')),
          );
          const remainingMm = dot(
            sub(itemAt(moved, (absorbing + 1) % n, 'corner'), itemAt(moved, absorbing, 'corner')),
            oldDirection,
          );
          if (remainingMm < MIN_WALL_LENGTH_MM) {
            return refuse(
              `wall ${absorbing} (${Math.round(wallLengthMm(outline, absorbing))} mm) is too short to take up the change`,
            );
          }
        }
        return withOutline(doc, moved);
      },
    },
  );
}

/** Adds a corner on wall `wall`, `atMm` along its inside face from its start corner; the room keeps its shape and the wall splits in two. */
export function insertCorner(wall: number, atMm: number): Command {
  return makeCommand(
    'insertCorner',
    { wall, atMm },
    {
      label: (_doc, args) => `Add corner to wall ${args.wall}`,
      run: (doc, args) => {
        const { outline, openings } = doc.shell;
        const n = outline.length;
        const bad = checkWall(doc.shell, args.wall) ?? checkMm(args.atMm, 'the position');
        if (bad) return refuse(bad);
        const lengthMm = wallLengthMm(outline, args.wall);
        if (args.atMm < MIN_WALL_LENGTH_MM || args.atMm > lengthMm - MIN_WALL_LENGTH_MM) {
          return refuse(`the new corner must fall between the ends of wall ${args.wall} (0 to ${Math.round(lengthMm)} mm)`);
        }
        const corner = addScaled(
          itemAt(outline, args.wall, 'corner'),
          normalise(sub(itemAt(outline, (args.wall + 1) % n, 'corner'), itemAt(outline, args.wall, 'corner'))),
          args.atMm,
        );
        const nextOutline = [...outline.slice(0, args.wall + 1), corner, ...outline.slice(args.wall + 1)];
        const moved: Opening[] = [];
        for (const opening of openings) {
          if (opening.wall < args.wall) moved.push(opening);
          else if (opening.wall > args.wall) moved.push({ ...opening, wall: opening.wall + 1 });
          else if (opening.offset + opening.width <= args.atMm) moved.push(opening);
          else if (opening.offset >= args.atMm)
            moved.push({ ...opening, wall: args.wall + 1, offset: opening.offset - args.atMm });
          else return refuse(`the new corner would fall inside ${openingWords(opening)}`);
        }
        return withOutline(doc, nextOutline, moved, sourcesAfterSplit(n, args.wall));
      },
    },
  );
}

/** Removes outline corner `index`; its two walls become one straight wall, and their openings keep their place along it. */
export function removeCorner(index: number): Command {
  return makeCommand(
    'removeCorner',
    { index },
    {
      label: (_doc, args) => `Remove corner ${args.index}`,
      run: (doc, args) => {
        const { outline, openings } = doc.shell;
        const n = outline.length;
        const bad = checkCorner(doc.shell, args.index);
        if (bad) return refuse(bad);
        if (n <= MIN_CORNERS) return refuse(`an outline needs at least ${MIN_CORNERS} corners`);
        const previous = (args.index + n - 1) % n;
        const nextOutline = outline.filter((_, i) => i !== args.index);
        const merged = wallAfterRemoval(previous, args.index, n);
        const mergedStart = itemAt(nextOutline, merged, 'corner');
        const mergedEnd = itemAt(nextOutline, (merged + 1) % nextOutline.length, 'corner');
        const moved = openings.map((opening): Opening => {
          const wall = wallAfterRemoval(opening.wall, args.index, n);
          if (opening.wall !== previous && opening.wall !== args.index)
            return wall === opening.wall ? opening : { ...opening, wall };
          const oldStart = itemAt(outline, opening.wall, 'corner');
          const oldEnd = itemAt(outline, (opening.wall + 1) % n, 'corner');
          const offset = Math.max(CORNER_MARGIN_MM, reprojectOffsetMm(opening, oldStart, oldEnd, mergedStart, mergedEnd));
          return { ...opening, wall, offset };
        });
        return withOutline(doc, nextOutline, moved, sourcesAfterRemoval(n, args.index));
      },
    },
  );
}

/** Sets the room's wall height in mm (floor to ceiling). */
export function setWallHeight(heightMm: number): Command {
  return makeCommand(
    'setWallHeight',
    { heightMm },
    {
      label: () => 'Change wall height',
      run: (doc, args) => {
        const bad = checkSizeMm(args.heightMm, 'the wall height');
        if (bad) return refuse(bad);
        return done({ ...doc, shell: { ...doc.shell, wallHeight: args.heightMm } });
      },
    },
  );
}

/** Marks the room as a child's, or not: the fit check then warns of climbable pieces near its windows. */
export function setChildRoom(childRoom: boolean): Command {
  return makeCommand(
    'setChildRoom',
    { childRoom },
    {
      label: (_doc, args) => (args.childRoom ? 'Mark as a child’s room' : 'Unmark as a child’s room'),
      run: (doc, args) => done({ ...doc, shell: { ...doc.shell, childRoom: args.childRoom } }),
    },
  );
}

/**
 * Sets a wall thickness in mm: without `wall`, the room's thickness for every wall without an
 * override; with `wall`, that wall's override (null clears it back to the room's thickness).
 */
export function setWallThickness(thicknessMm: number | null, wall?: number): Command {
  return makeCommand(
    'setWallThickness',
    { thicknessMm, wall },
    {
      label: (_doc, args) => (args.wall === undefined ? 'Change wall thickness' : `Change wall ${args.wall} thickness`),
      run: (doc, args) => {
        if (args.wall === undefined) {
          if (args.thicknessMm === null) return refuse('the room needs a wall thickness');
          const bad = checkSizeMm(args.thicknessMm, 'the thickness');
          if (bad) return refuse(bad);
          return done({ ...doc, shell: { ...doc.shell, wallThickness: args.thicknessMm } });
        }
        const bad =
          checkWall(doc.shell, args.wall) ?? (args.thicknessMm === null ? null : checkSizeMm(args.thicknessMm, 'the thickness'));
        if (bad) return refuse(bad);
        const overrides = [...(doc.shell.wallThicknesses ?? [])];
        while (overrides.length <= args.wall) overrides.push(null);
        overrides[args.wall] = args.thicknessMm;
        while (overrides.length > 0 && overrides[overrides.length - 1] === null) overrides.pop();
        const shell: RoomShell = { ...doc.shell, wallThicknesses: overrides };
        if (overrides.length === 0) delete shell.wallThicknesses;
        return done({ ...doc, shell });
      },
    },
  );
}

/**
 * Rebuilds the outline from a measured walk (lengths mm, turns degrees) whose end misses its start,
 * closing it with closeOutline: the last two walls stretch and every measured angle is kept.
 */
export function closeOutlineGap(steps: readonly WalkStep[], start?: WalkStart): Command {
  return makeCommand(
    'closeOutlineGap',
    { steps, start },
    {
      label: () => 'Close the outline',
      run: (doc, args) => {
        if (args.steps.length < MIN_CORNERS)
          return refuse(`a walk needs at least ${MIN_CORNERS} walls (has ${args.steps.length})`);
        for (const [i, step] of args.steps.entries()) {
          const bad =
            checkSizeMm(step.lengthMm, `wall ${i} length`) ??
            (step.turnDeg === undefined ? null : checkNumber(step.turnDeg, `the turn after wall ${i}`));
          if (bad) return refuse(bad);
        }
        return withOutline(doc, closeOutline(args.steps, args.start).corners);
      },
    },
  );
}
