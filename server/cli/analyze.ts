// The analysis command: reads a plan file and prints its take-off as one JSON object.
// Usage: npm run --silent analyze -- FILE [--coats N] [--coverage M2_PER_L] [--waste PERCENT] [--walkway MM]
import { readFile } from 'node:fs/promises';
import { checkFit } from '../../shared/analysis/fit/index';
import { computeTakeoff, type TakeoffOptions } from '../../shared/analysis/takeoff';
import { readPlanFile } from '../../shared/schemas/plan-file';

const USAGE = 'usage: analyze FILE [--coats N] [--coverage M2_PER_L] [--waste PERCENT] [--walkway MM]';

interface FlagRule {
  key: keyof TakeoffOptions;
  accepts: (value: number) => boolean;
  expected: string;
}

const FLAGS: Record<string, FlagRule> = {
  '--coats': { key: 'coats', accepts: (v) => Number.isInteger(v) && v >= 1, expected: 'a whole number of coats, 1 or more' },
  '--coverage': { key: 'coverage_m2_per_l', accepts: (v) => v > 0, expected: 'square metres per litre, more than 0' },
  '--waste': { key: 'wastePercent', accepts: (v) => v >= 0 && v < 100, expected: 'a percentage from 0 to under 100' },
  '--walkway': { key: 'walkwayMm', accepts: (v) => v > 0, expected: 'a width in mm, more than 0' },
};

type ParsedArgs = { ok: true; file: string; options: Partial<TakeoffOptions> } | { ok: false; message: string };

/** Command-line words to a file path and take-off options (coverage m²/L, waste %, walkway mm). */
function parseAnalyzeArgs(args: readonly string[]): ParsedArgs {
  const options: Partial<TakeoffOptions> = {};
  let file: string | null = null;
  for (let i = 0; i < args.length; i++) {
    const word = args[i];
    const [flag, inline] = word.startsWith('--') ? word.split('=', 2) : [word, undefined];
    const rule = FLAGS[flag];
    if (rule) {
      const text = inline ?? args[++i];
      const value = text === undefined || text.trim() === '' ? NaN : Number(text);
      if (!Number.isFinite(value) || !rule.accepts(value)) {
        return {
          ok: false,
          message: `${flag}: expected ${rule.expected}, got ${text === undefined ? 'nothing' : JSON.stringify(text)}`,
        };
      }
      options[rule.key] = value;
    } else if (word.startsWith('-') && word !== '-') {
      return { ok: false, message: `${word}: unknown option\n${USAGE}` };
    } else if (file === null) {
      file = word;
    } else {
      return { ok: false, message: `${word}: only one plan file at a time\n${USAGE}` };
    }
  }
  if (file === null) return { ok: false, message: `no plan file given\n${USAGE}` };
  return { ok: true, file, options };
}

async function main(): Promise<number> {
  const args = parseAnalyzeArgs(process.argv.slice(2));
  if (!args.ok) {
    process.stderr.write(`analyze: ${args.message}\n`);
    return 1;
  }
  let text: string;
  try {
    text = await readFile(args.file, 'utf8');
  } catch (error) {
    const reason = error instanceof Error && 'code' in error ? String(error.code) : String(error);
    process.stderr.write(`analyze: ${args.file}: cannot read the file (${reason})\n`);
    return 1;
  }
  const result = readPlanFile(text);
  if (!result.ok) {
    process.stderr.write(`analyze: ${args.file} is not a valid plan file:\n${result.errors.map((e) => `  ${e}`).join('\n')}\n`);
    return 1;
  }
  const { room, option } = result.plan;
  const findings = checkFit(room, option.pieces, { walkwayMm: args.options.walkwayMm });
  process.stdout.write(`${JSON.stringify(computeTakeoff(room, args.options, findings))}\n`);
  return 0;
}

process.exitCode = await main();
