// Where daylight comes into a room: one light per window, in the middle of the window's inside
// face, shining into the room. Scene metres, y up; pure so it can be tested without a renderer.
import { placeShellOpenings } from '../../shared/geometry/openings';
import { layoutShellWalls } from '../../shared/geometry/walls';
import type { RoomShell } from '../../shared/schemas/room';

/** The light sits this far (m) inside the room from the window's inside face, so no reveal hides it. */
export const WINDOW_LIGHT_INSET_M = 0.02;

export interface WindowLightRect {
  openingId: string;
  /** Middle of the pane as seen from inside, scene metres. */
  centre: [number, number, number];
  /** Horizontal unit vector into the room, scene axes. */
  inward: [number, number, number];
  widthM: number;
  heightM: number;
}

/** One light rectangle per window of the shell (plan mm in, scene metres out). */
export function windowLightRects(shell: RoomShell): WindowLightRect[] {
  const walls = layoutShellWalls(shell);
  return placeShellOpenings(shell)
    .placements.filter((p) => p.type === 'window')
    .map((p) => {
      const wall = walls[p.wall];
      const inward: [number, number, number] = [-wall.outward[0], 0, -wall.outward[1]];
      const midX = (p.insideStart[0] + p.insideEnd[0]) / 2000;
      const midZ = (p.insideStart[1] + p.insideEnd[1]) / 2000;
      return {
        openingId: p.id,
        centre: [midX + inward[0] * WINDOW_LIGHT_INSET_M, (p.sillMm + p.headMm) / 2000, midZ + inward[2] * WINDOW_LIGHT_INSET_M],
        inward,
        widthM: (p.toMm - p.fromMm) / 1000,
        heightM: (p.headMm - p.sillMm) / 1000,
      };
    });
}
