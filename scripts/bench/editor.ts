// The room editor's work per drag event in a room of 60 pieces: the command through the undo
// history (one gesture), the plan layout, and the 3D scene data rebuilt for the preview.
import { applyToHistory, createHistory, movePiece } from '../../shared/commands';
import { buildRoomScene } from '../../shared/geometry/scene';
import { optionDocSchema } from '../../shared/schemas/option';
import { planLayout } from '../../src/features/rooms/editor/plan/plan-geometry';
import { typicalRoom } from './typical-room';

const PIECES = 60;
const EVENTS = 600;

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.floor(sorted.length / 2)];
}

export async function benchEditor(): Promise<void> {
  const { shell } = typicalRoom();
  const pieces = Array.from({ length: PIECES }, (_, i) => ({
    id: `p${i}`,
    name: `Piece ${i}`,
    x: 500 + (i % 10) * 450,
    y: 500 + Math.floor(i / 10) * 600,
    width: 380,
    depth: 300,
    height: 500,
    rotation: (i * 15) % 360,
    status: 'new' as const,
  }));
  const option = optionDocSchema.parse({ pieces });
  let history = createHistory({ shell, options: { a: option } });
  const command: number[] = [];
  const layout: number[] = [];
  const scene: number[] = [];
  for (let i = 0; i < EVENTS; i++) {
    const t0 = performance.now();
    const result = applyToHistory(history, movePiece('a', 'p7', 2000 + (i % 50) * 10, 1500 + (i % 30) * 5), { gesture: 'drag' });
    if (!result.ok) throw new Error(result.message);
    history = result.history;
    const t1 = performance.now();
    planLayout(history.doc.shell, history.doc.options.a.pieces);
    const t2 = performance.now();
    buildRoomScene(history.doc.shell, history.doc.options.a);
    const t3 = performance.now();
    command.push(t1 - t0);
    layout.push(t2 - t1);
    scene.push(t3 - t2);
  }
  const steps = history.undoSteps.length;
  console.log(
    `editor: drag event in a room of ${PIECES} pieces (${EVENTS} events, median ms): command ${median(command).toFixed(3)}, plan layout ${median(layout).toFixed(3)}, 3D scene data ${median(scene).toFixed(3)}; total ${(median(command) + median(layout) + median(scene)).toFixed(3)} ms of a 16.7 ms frame; the drag is ${steps} undo step`,
  );
}
