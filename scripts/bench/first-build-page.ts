// The page the forms bench opens in Chromium: the typical furnished room ready, and one call that
// builds its scene data once (the shell and boxes, then for forms every piece's form), timed.
import { buildPieceForms } from '../../shared/geometry/forms/piece-forms';
import { buildRoomScene } from '../../shared/geometry/scene';
import { typicalFurnishedRoom } from './typical-room';

export interface PageFirstBuild {
  /** ms from the start of the build to the boxes, and of the whole build. */
  boxes: number;
  total: number;
}

const { shell, option } = typicalFurnishedRoom();

(globalThis as { firstBuild?: (forms: boolean) => PageFirstBuild }).firstBuild = (forms) => {
  const t0 = performance.now();
  buildRoomScene(shell, option);
  const t1 = performance.now();
  if (forms) buildPieceForms(option.pieces);
  return { boxes: t1 - t0, total: performance.now() - t0 };
};
