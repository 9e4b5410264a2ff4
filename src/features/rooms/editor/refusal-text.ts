// The editor's own wording for a refused change: in the person's unit, walls numbered from 1 as the
// panels show them, and never an id. Built from the structured problems of validateRoomShell; the
// plan-file readers keep their fixed wording.
import type { FieldProblem } from '../../../../shared/geometry/validate';
import type { RoomShell } from '../../../../shared/schemas/room';
import { formatLength, type LengthUnit } from '../../../../shared/units/length';
import type { HistoryFailure } from './use-room-editor';

const TYPE_WORD = { door: 'door', window: 'window', passage: 'passage' } as const;

function openingWords(shell: RoomShell, index: number | undefined): string {
  const opening = index === undefined ? undefined : shell.openings[index];
  return opening ? `The ${TYPE_WORD[opening.type]}` : 'The opening';
}

/** One problem as a sentence for the designer. */
export function problemSentence(problem: FieldProblem, shell: RoomShell, unit: LengthUnit): string | null {
  const len = (mm: number | undefined) => (mm === undefined ? '' : formatLength(mm, unit));
  const wall = problem.wall === undefined ? '' : `wall ${problem.wall + 1}`;
  const what = openingWords(shell, problem.opening);
  switch (problem.rule) {
    case 'window-above-ceiling':
      return `${what}’s top would be at ${len(problem.valueMm)} (sill ${len(problem.sillMm)} + height ${len(problem.heightMm)}), above the ceiling at ${len(problem.limitMm)}.`;
    case 'opening-taller-than-wall':
      return `${what} would be ${len(problem.valueMm)} high, taller than the ceiling at ${len(problem.limitMm)}.`;
    case 'opening-longer-than-wall':
      return `${what} is wider than ${wall} allows: at most ${len(problem.limitMm)} (the wall less ${len(50)} at each corner).`;
    case 'opening-near-start':
      return `${what} must start at least ${len(problem.limitMm)} from the corner of ${wall}.`;
    case 'opening-past-end':
      return `${what} would run past the end of ${wall}: from the wall start it can be at most ${len(Math.max(0, problem.limitMm ?? 0))}.`;
    case 'openings-overlap':
      return `${what} would overlap the ${shell.openings[problem.otherOpening ?? -1]?.type ?? 'opening'} on ${wall}.`;
    case 'walls-cross':
      return `Wall ${(problem.wall ?? 0) + 1} would cross wall ${(problem.otherWall ?? 0) + 1}.`;
    case 'zero-length-wall':
      return `Wall ${(problem.wall ?? 0) + 1} would have no length.`;
    case 'too-few-corners':
      return 'A room needs at least 3 walls.';
    case 'no-such-wall':
      return `${what} is on a wall the room no longer has.`;
    case 'too-many-thicknesses':
    case undefined:
      return null;
  }
}

/** A refusal's sentence: the first structured problem in the person's terms, else the command's own words without ids or mm. */
export function refusalText(failure: HistoryFailure, shell: RoomShell, unit: LengthUnit): string {
  for (const p of failure.problems) {
    const sentence = problemSentence(p, shell, unit);
    if (sentence) return sentence;
  }
  return failure.message
    .replace(/\b(door|window|passage|piece|opening)-[0-9a-f]{6,}\b/g, '')
    .replace(/\b(\d+(?:\.\d+)?) mm\b/g, (_m, n: string) => formatLength(Number(n), unit))
    .replace(/\bwall (\d+)\b/g, (_m, n: string) => `wall ${Number(n) + 1}`)
    .replace(/\s{2,}/g, ' ');
}
