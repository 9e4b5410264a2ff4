// Scene data for a typical room's pieces: plain boxes against forms, the same room in the same run.
import { buildPieceForms, clearFormCache } from '../../shared/geometry/forms/piece-forms';
import { formTriangles } from '../../shared/geometry/forms/mesh';
import { buildRoomScene } from '../../shared/geometry/scene';
import { loadavg } from 'node:os';
import { typicalFurnishedRoom } from './typical-room';

const REPEATS = 30;
const BATCH = 20;

function median(run: () => void): number {
  const ms: number[] = [];
  for (let r = 0; r < REPEATS; r++) {
    const t0 = performance.now();
    for (let i = 0; i < BATCH; i++) run();
    ms.push((performance.now() - t0) / BATCH);
  }
  ms.sort((a, b) => a - b);
  return ms[Math.floor(REPEATS / 2)];
}

/** Prints ms per room for the scene data with boxes and with forms (shell included in both), and the forms' triangles. */
export async function benchForms(): Promise<void> {
  const { shell, option } = typicalFurnishedRoom();
  for (let i = 0; i < 30; i++) {
    buildRoomScene(shell, option);
    buildPieceForms(option.pieces);
  }
  const boxes = median(() => buildRoomScene(shell, option));
  // From nothing (a room opened for the first time) and again (a piece dragged: the others' forms are kept).
  const cold = median(() => {
    clearFormCache();
    buildRoomScene(shell, option);
    buildPieceForms(option.pieces);
  });
  const forms = median(() => {
    buildRoomScene(shell, option);
    buildPieceForms(option.pieces);
  });
  const triangles = buildPieceForms(option.pieces).reduce((n, f) => n + formTriangles(f.meshes), 0);
  const kinds = new Set(option.pieces.map((p) => p.kind)).size;
  console.log(
    `forms: scene data, typical room of 40 pieces (${kinds} kinds): boxes ${boxes.toFixed(3)} ms; with forms built from nothing ${cold.toFixed(3)} ms ` +
      `(${(cold / boxes).toFixed(2)}×), with forms kept from the last build ${forms.toFixed(3)} ms (${(forms / boxes).toFixed(2)}×); ` +
      `forms ${triangles} triangles (load ${loadavg()[0].toFixed(1)})`,
  );
}
