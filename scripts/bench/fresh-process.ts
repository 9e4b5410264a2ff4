// Benches run work in a fresh Node process where what is measured must not carry over from the
// bench itself: peak resident memory (getrusage maxRSS: the work's own plus Node's baseline, not
// the generator's buffers), or a first run before the engine has compiled anything.
import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';

/** The process's peak resident memory so far (getrusage maxRSS is in kilobytes on Linux). */
export const maxRssMb = () => process.resourceUsage().maxRSS / 1024;

/**
 * Runs the bench module `moduleUrl` again as a worker (`flag` and `args` after it, Node started
 * with `nodeFlags`) and answers the JSON it printed last.
 */
export function runFresh<T>(moduleUrl: string, flag: string, args: string[], nodeFlags: string[] = []): T {
  const child = spawnSync(process.execPath, [...nodeFlags, '--import', 'tsx', fileURLToPath(moduleUrl), flag, ...args], {
    encoding: 'utf8',
  });
  if (child.status !== 0) throw new Error(`bench worker ${flag} failed: ${child.stderr}`);
  return JSON.parse(child.stdout.trim().split('\n').pop()!) as T;
}

/** "within the 500 MB target" or "OVER the 500 MB target". */
export const rssVerdict = (peakMb: number, targetMb: number) =>
  `${peakMb < targetMb ? 'within' : 'OVER'} the ${targetMb} MB target`;

/** In a worker process: runs `work` on the arguments after `flag` and prints its answer as JSON. Answers whether it ran. */
export async function serveAsWorker(flag: string, work: (args: string[]) => Promise<unknown>): Promise<boolean> {
  if (process.argv[2] !== flag) return false;
  console.log(JSON.stringify(await work(process.argv.slice(3))));
  return true;
}
