// The fit check: every finding about a layout, from the room shell and the option's pieces (plan mm).
import type { Piece } from '../../schemas/option';
import type { RoomShell } from '../../schemas/room';
import { findingKindSchema, type Finding } from './finding';
import { DEFAULT_WALKWAY_MM } from './clearances';
import { placedBoxes } from './boxes';
import { findCannotOpen } from './cannot-open';
import { findDoorSwings } from './door-swing';
import { findTooBigForDoor } from './door-fit';
import { findOverlaps } from './overlap';
import { findOutsideRoom } from './outside-room';
import { findWalkwayProblems } from './walkway';
import { findBlockedWindows } from './window';
import { findClimbableNearWindows, findTallNotFixed } from './safety';

export interface FitCheckOptions {
  /** Clear width (mm) a route from a door to a piece's front needs; DEFAULT_WALKWAY_MM when left out. */
  walkwayMm?: number;
}

const KIND_ORDER = new Map(findingKindSchema.options.map((kind, index) => [kind, index]));

// Plain code-unit order, not the locale's: the same ids sort the same on every machine.
function compareText(a: string, b: string): number {
  return a < b ? -1 : a > b ? 1 : 0;
}

/**
 * Findings for a validated room shell and an option's pieces (plan mm): only placed pieces count.
 * Ordered by kind (as the README's finding kinds list them), then piece ids, then opening ids, so the same layout
 * always reads the same.
 */
export function checkFit(shell: RoomShell, pieces: readonly Piece[], options: FitCheckOptions = {}): Finding[] {
  const walkwayMm = options.walkwayMm ?? DEFAULT_WALKWAY_MM;
  const boxes = placedBoxes(pieces);
  return sortFindings([
    ...findOverlaps(boxes),
    ...findOutsideRoom(shell, boxes),
    ...findDoorSwings(shell, boxes),
    ...findCannotOpen(shell, boxes),
    ...findBlockedWindows(shell, boxes),
    ...findWalkwayProblems(shell, boxes, walkwayMm),
    ...findTooBigForDoor(shell, boxes),
    ...findClimbableNearWindows(shell, boxes),
    ...findTallNotFixed(boxes),
  ]);
}

/** Findings by kind (in the order findingKindSchema lists them), then piece ids, then opening ids; each one's keys worked out once. */
function sortFindings(findings: Finding[]): Finding[] {
  const keyed = findings.map((finding) => ({
    finding,
    kind: KIND_ORDER.get(finding.kind) ?? 0,
    pieces: finding.pieces.join('\u0000'),
    openings: finding.openings.join('\u0000'),
  }));
  keyed.sort((a, b) => a.kind - b.kind || compareText(a.pieces, b.pieces) || compareText(a.openings, b.openings));
  return keyed.map((k) => k.finding);
}
