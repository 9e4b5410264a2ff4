// Bench: milliseconds per room for the 3D scene data plus the take-off, in batches of 1, 10 and
// 100 typical rooms.
import { computeTakeoff } from '../../shared/analysis/takeoff';
import { buildRoomScene } from '../../shared/geometry/scene';
import { typicalRoom } from './typical-room';

const ROOM_COUNTS = [1, 10, 100];
/** Repeats of each batch, so one slow garbage collection does not decide the figure. */
const REPEATS = 20;

/** Prints milliseconds per room for scene data plus take-off, for batches of 1, 10 and 100 typical rooms. */
export async function benchGeometry(): Promise<void> {
  const { shell, option } = typicalRoom();
  // Warm the JIT so the first batch measures steady running, as in a long-lived page or server.
  for (let i = 0; i < 50; i++) {
    buildRoomScene(shell, option);
    computeTakeoff(shell);
  }
  for (const rooms of ROOM_COUNTS) {
    const msPerRoom: number[] = [];
    for (let repeat = 0; repeat < REPEATS; repeat++) {
      const started = performance.now();
      for (let r = 0; r < rooms; r++) {
        buildRoomScene(shell, option);
        computeTakeoff(shell);
      }
      msPerRoom.push((performance.now() - started) / rooms);
    }
    msPerRoom.sort((a, b) => a - b);
    const median = msPerRoom[Math.floor(REPEATS / 2)];
    console.log(
      `geometry: scene data + take-off, ${rooms} room(s) of 8 walls, 6 openings, 40 pieces: ` +
        `${median.toFixed(3)} ms per room median, ${msPerRoom[0].toFixed(3)} best (${REPEATS} runs)`,
    );
  }
}
