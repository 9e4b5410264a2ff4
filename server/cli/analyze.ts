// The analysis command: reads a plan file and prints its take-off as one JSON object.
// Usage: npm run --silent analyze -- FILE [--coats N] [--coverage M2_PER_L] [--waste PERCENT] [--walkway MM]
import { readFile } from 'node:fs/promises';
import { analysisOutput } from '../../shared/analysis/analysis-output';
import { MAX_WALKWAY_MM, MIN_WALKWAY_MM } from '../../shared/analysis/fit/clearances';
import { checkFit } from '../../shared/analysis/fit/index';
import { computeTakeoff } from '../../shared/analysis/takeoff';
import {
  MAX_COATS,
  MAX_COVERAGE_M2_PER_L,
  MAX_WASTE_PERCENT,
  MIN_COVERAGE_M2_PER_L,
  takeoffSettingsSchema,
} from '../../shared/analysis/takeoff-settings';
import { readPlanFile } from '../../shared/schemas/plan-file';

const USAGE = 'usage: analyze FILE [--coats N] [--coverage M2_PER_L] [--waste PERCENT] [--walkway MM]';

interface AnalyzeOptions {
  coats?: number;
  coverageM2PerL?: number;
  wastePercent?: number;
  walkwayMm?: number;
}

interface FlagRule {
  key: keyof AnalyzeOptions;
  accepts: (value: number) => boolean;
  expected: string;
}

// Coats, coverage and waste are accepted as the take-off page accepts them: one settings schema.
const settingsField = (key: 'coats' | 'coverageM2PerL' | 'wastePercent') => (value: number) =>
  takeoffSettingsSchema.shape[key].safeParse(value).success;

const FLAGS: Record<string, FlagRule> = {
  '--coats': { key: 'coats', accepts: settingsField('coats'), expected: `a whole number of coats, 1 to ${MAX_COATS}` },
  '--coverage': {
    key: 'coverageM2PerL',
    accepts: settingsField('coverageM2PerL'),
    expected: `square metres per litre, ${MIN_COVERAGE_M2_PER_L} to ${MAX_COVERAGE_M2_PER_L}`,
  },
  '--waste': {
    key: 'wastePercent',
    accepts: settingsField('wastePercent'),
    expected: `a percentage from 0 to ${MAX_WASTE_PERCENT}`,
  },
  // The editor's Check step accepts the same widths (one range, beside the default walkway).
  '--walkway': {
    key: 'walkwayMm',
    accepts: (v) => v >= MIN_WALKWAY_MM && v <= MAX_WALKWAY_MM,
    expected: `a width in mm, ${MIN_WALKWAY_MM} to ${MAX_WALKWAY_MM}`,
  },
};

type ParsedArgs = { ok: true; file: string; options: AnalyzeOptions } | { ok: false; message: string };

/** Command-line words to a file path and take-off options (coverage m²/L, waste %, walkway mm). */
function parseAnalyzeArgs(args: readonly string[]): ParsedArgs {
  const options: AnalyzeOptions = {};
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
  const { walkwayMm, ...settings } = args.options;
  const findings = checkFit(room, option.pieces, { walkwayMm });
  process.stdout.write(`${JSON.stringify(analysisOutput(computeTakeoff(room, settings), findings))}\n`);
  return 0;
}

process.exitCode = await main();
