// The geometric rules a room shell must keep beyond its schema (corners, wall lengths, crossings,
// openings that fit their walls), each problem reported with its field path, message and facts.
import type { RoomShell } from '../schemas/room';
import { findSelfCrossings } from './polygon';
import { CORNER_MARGIN_MM, MIN_WALL_LENGTH_MM, OPENING_OVERLAP_TOLERANCE_MM } from './tolerances';
import { distance } from './vec';

/** Which rule a problem breaks, for screens that word it themselves (in the person's unit and numbering). */
export type ProblemRule =
  | 'too-few-corners'
  | 'zero-length-wall'
  | 'walls-cross'
  | 'too-many-thicknesses'
  | 'no-such-wall'
  | 'opening-longer-than-wall'
  | 'opening-near-start'
  | 'opening-past-end'
  | 'window-above-ceiling'
  | 'opening-taller-than-wall'
  | 'openings-overlap';

/**
 * A rule a document breaks, with the field it concerns written as a path like `openings[1].width`.
 * `message` is the fixed wording of the plan-file readers (walls numbered from 0, mm); the other
 * fields carry the same facts as values: walls and openings by index from 0, lengths in mm.
 */
export interface FieldProblem {
  path: string;
  message: string;
  rule?: ProblemRule;
  /** The field within its thing: 'width', 'offset', 'height', 'outline'… */
  field?: string;
  wall?: number;
  otherWall?: number;
  opening?: number;
  otherOpening?: number;
  /** The refused value and the limit it breaks (mm). */
  valueMm?: number;
  limitMm?: number;
  /** For a window's head: its sill and height (mm). */
  sillMm?: number;
  heightMm?: number;
}

function mm(value: number): string {
  return `${Number(value.toFixed(1))} mm`;
}

function join(prefix: string, path: string): string {
  return prefix === '' ? path : `${prefix}.${path}`;
}

function outlineProblems(shell: RoomShell, prefix: string): FieldProblem[] {
  const { outline } = shell;
  const problems: FieldProblem[] = [];
  const n = outline.length;
  for (let i = 0; i < n; i++) {
    if (distance(outline[i]!, outline[(i + 1) % n]!) < MIN_WALL_LENGTH_MM) {
      problems.push({
        path: join(prefix, `outline[${(i + 1) % n}]`),
        message: `wall ${i} has zero length (corner ${(i + 1) % n} repeats corner ${i})`,
        rule: 'zero-length-wall',
        field: 'outline',
        wall: i,
      });
    }
  }
  // Zero-length walls make every neighbour "cross", so only look for crossings in an outline without them.
  if (problems.length === 0) {
    for (const { wallA, wallB } of findSelfCrossings(outline)) {
      problems.push({
        path: join(prefix, 'outline'),
        message: `wall ${wallA} crosses wall ${wallB}`,
        rule: 'walls-cross',
        field: 'outline',
        wall: wallA,
        otherWall: wallB,
      });
    }
  }
  return problems;
}

function thicknessProblems(shell: RoomShell, prefix: string): FieldProblem[] {
  const count = shell.wallThicknesses?.length ?? 0;
  if (count <= shell.outline.length) return [];
  return [
    {
      path: join(prefix, 'wallThicknesses'),
      message: `has ${count} entries but the outline has ${shell.outline.length} walls`,
      rule: 'too-many-thicknesses',
      field: 'wallThicknesses',
    },
  ];
}

function openingProblems(shell: RoomShell, prefix: string): FieldProblem[] {
  const problems: FieldProblem[] = [];
  const n = shell.outline.length;
  const byWall = new Map<number, { index: number; from: number; to: number }[]>();
  shell.openings.forEach((opening, index) => {
    const at = (field: string) => join(prefix, `openings[${index}].${field}`);
    if (opening.wall >= n) {
      problems.push({
        path: at('wall'),
        message: `there is no wall ${opening.wall} (the outline has ${n} walls, 0 to ${n - 1})`,
        rule: 'no-such-wall',
        field: 'wall',
        opening: index,
        wall: opening.wall,
      });
      return;
    }
    const wallLengthMm = distance(shell.outline[opening.wall]!, shell.outline[(opening.wall + 1) % n]!);
    const usableMm = wallLengthMm - 2 * CORNER_MARGIN_MM;
    if (opening.width > usableMm) {
      problems.push({
        path: at('width'),
        message: `longer than wall ${opening.wall} (${mm(wallLengthMm)}) less ${CORNER_MARGIN_MM} mm at each corner`,
        rule: 'opening-longer-than-wall',
        field: 'width',
        opening: index,
        wall: opening.wall,
        valueMm: opening.width,
        limitMm: usableMm,
      });
    } else if (opening.offset < CORNER_MARGIN_MM) {
      problems.push({
        path: at('offset'),
        message: `closer than ${CORNER_MARGIN_MM} mm to the start corner of wall ${opening.wall}`,
        rule: 'opening-near-start',
        field: 'offset',
        opening: index,
        wall: opening.wall,
        valueMm: opening.offset,
        limitMm: CORNER_MARGIN_MM,
      });
    } else if (opening.offset + opening.width > wallLengthMm - CORNER_MARGIN_MM) {
      problems.push({
        path: at('offset'),
        message: `runs past the end of wall ${opening.wall} (${mm(wallLengthMm)}): ends at ${mm(opening.offset + opening.width)}, at most ${mm(wallLengthMm - CORNER_MARGIN_MM)}`,
        rule: 'opening-past-end',
        field: 'offset',
        opening: index,
        wall: opening.wall,
        valueMm: opening.offset,
        limitMm: wallLengthMm - CORNER_MARGIN_MM - opening.width,
      });
    }
    const wallHeightMm = shell.wallHeight;
    if (opening.type === 'window') {
      if (opening.sill + opening.height > wallHeightMm) {
        problems.push({
          path: at('height'),
          message: `window head (sill ${mm(opening.sill)} + height ${mm(opening.height)}) is above the wall height (${mm(wallHeightMm)})`,
          rule: 'window-above-ceiling',
          field: 'height',
          opening: index,
          wall: opening.wall,
          valueMm: opening.sill + opening.height,
          limitMm: wallHeightMm,
          sillMm: opening.sill,
          heightMm: opening.height,
        });
      }
    } else if (opening.height > wallHeightMm) {
      problems.push({
        path: at('height'),
        message: `${opening.type} is taller than the wall (${mm(wallHeightMm)})`,
        rule: 'opening-taller-than-wall',
        field: 'height',
        opening: index,
        wall: opening.wall,
        valueMm: opening.height,
        limitMm: wallHeightMm,
      });
    }
    const list = byWall.get(opening.wall) ?? [];
    list.push({ index, from: opening.offset, to: opening.offset + opening.width });
    byWall.set(opening.wall, list);
  });
  for (const [wall, list] of byWall) {
    const sorted = [...list].sort((a, b) => a.from - b.from);
    // Compare each opening with the one reaching furthest so far, so a wide opening that swallows
    // several small ones is reported against each of them.
    let before = sorted[0];
    if (!before) continue;
    for (let k = 1; k < sorted.length; k++) {
      const here = sorted[k]!;
      if (before.to - here.from > OPENING_OVERLAP_TOLERANCE_MM) {
        problems.push({
          path: join(prefix, `openings[${here.index}].offset`),
          message: `overlaps ${shell.openings[before.index]!.id} (openings[${before.index}]) on wall ${wall}`,
          rule: 'openings-overlap',
          field: 'offset',
          opening: here.index,
          otherOpening: before.index,
          wall,
        });
      }
      if (here.to > before.to) before = here;
    }
  }
  return problems;
}

/**
 * Geometric rules a room shell (plan mm) must keep beyond what its schema checks. Paths are relative
 * to the shell, joined to `prefix` (e.g. 'room'); empty means the shell can be drawn and measured.
 */
export function validateRoomShell(shell: RoomShell, prefix = ''): FieldProblem[] {
  if (shell.outline.length < 3) {
    return [
      {
        path: join(prefix, 'outline'),
        message: `needs at least 3 corners (has ${shell.outline.length})`,
        rule: 'too-few-corners',
        field: 'outline',
      },
    ];
  }
  const outline = outlineProblems(shell, prefix);
  // Openings are measured along walls, which mean nothing until the outline itself is sound.
  if (outline.length > 0) return [...outline, ...thicknessProblems(shell, prefix)];
  return [...thicknessProblems(shell, prefix), ...openingProblems(shell, prefix)];
}
