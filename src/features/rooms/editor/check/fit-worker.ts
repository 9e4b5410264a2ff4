// Runs the fit check off the main thread, so dragging stays smooth in a full room.
import '../../../../lib/zod-no-eval';
import { checkFit } from '../../../../../shared/analysis/fit';
import type { Piece } from '../../../../../shared/schemas/option';
import type { RoomShell } from '../../../../../shared/schemas/room';

export interface FitRequest {
  seq: number;
  shell: RoomShell;
  pieces: Piece[];
  walkwayMm: number;
}

self.onmessage = (event: MessageEvent<FitRequest>) => {
  const { seq, shell, pieces, walkwayMm } = event.data;
  const started = performance.now();
  try {
    const findings = checkFit(shell, pieces, { walkwayMm });
    self.postMessage({ seq, findings, ms: performance.now() - started });
  } catch (err) {
    self.postMessage({ seq, findings: [], ms: 0, error: err instanceof Error ? err.message : String(err) });
  }
};
