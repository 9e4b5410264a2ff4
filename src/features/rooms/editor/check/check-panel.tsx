// The room editor's Check step: the walkway width setting, the fit check findings (pick one to highlight
// its pieces; open ones first, then those marked as seen), a word on how heavy the option's piece
// models are for the client's view, reminders for tall pieces, and the room's take-off.
import { MAX_WALKWAY_MM, MIN_WALKWAY_MM } from '../../../../../shared/analysis/fit/clearances';
import type { Finding } from '../../../../../shared/analysis/fit/finding';
import { sortBySeen } from '../../../../../shared/analysis/seen-findings';
import type { Piece, SeenMark } from '../../../../../shared/schemas/option';
import type { RoomShell } from '../../../../../shared/schemas/room';
import { formatLength, type LengthUnit } from '../../../../../shared/units/length';
import { LengthField } from '../../../../components/ui/length-field';
import { Notice, Spinner } from '../../../../components/ui/layout';
import { TakeoffTable } from '../../components/takeoff-table';
import { TALL_PIECE_MM } from '../furnish-panel';
import { FindingItem, type MarkAnswer } from './finding-item';
import { ModelBudgetNotice } from './model-budget-notice';
import type { ModelBudget } from '../../../../../shared/analysis/model-budget';
import type { FitResult } from './use-fit-check';

const KIND_TITLE: Record<Finding['kind'], string> = {
  overlap: 'Pieces overlap',
  'outside-room': 'Outside the room',
  'door-swing': 'In a door’s swing',
  'cannot-open': 'Cannot open',
  'window-blocked': 'In front of a window',
  'narrow-walkway': 'Tight to pass',
  unreachable: 'Cannot be reached',
  'too-big-for-door': 'Too big for the doors',
  'climbable-near-window': 'Climbable near a window',
  'tall-not-fixed': 'Not fixed to the wall',
};

/** The findings as listed: the open ones, then the seen ones, each in the check's order. */
function listed(findings: readonly Finding[], marks: readonly SeenMark[]) {
  const { open, seen } = sortBySeen(findings, marks);
  return [...open, ...seen];
}

export function CheckPanel({
  shell,
  pieces,
  result,
  walkwayMm,
  onWalkway,
  unit,
  selected,
  onChoose,
  marks,
  onMark,
  onUnmark,
  readOnly,
  modelBudget = null,
}: {
  shell: RoomShell;
  pieces: Piece[];
  result: FitResult | null;
  walkwayMm: number;
  onWalkway: (mm: number) => void;
  unit: LengthUnit;
  /** The finding picked, by its place in `result.findings`. */
  selected: number | null;
  onChoose: (index: number | null) => void;
  /** The option's seen marks. */
  marks: readonly SeenMark[];
  onMark: (key: string, note: string) => MarkAnswer;
  onUnmark: (key: string) => void;
  /** Whether marks may be changed (not while viewing, nor on a decided option). */
  readOnly: boolean;
  /** How heavy the option's piece models make the client's view; null without models. */
  modelBudget?: ModelBudget | null;
}) {
  const tall = pieces.filter((p) => p.placed && p.height >= TALL_PIECE_MM);
  return (
    <div className="flex flex-col gap-5">
      {/* About the whole option, so above its findings, however many there are. */}
      <ModelBudgetNotice budget={modelBudget} />
      <LengthField
        commit="blur"
        label="Walkway width"
        unit={unit}
        valueMm={walkwayMm}
        onChange={(mm) => {
          if (mm === null) return 'Enter a width.';
          if (mm < MIN_WALKWAY_MM || mm > MAX_WALKWAY_MM)
            return `Between ${formatLength(MIN_WALKWAY_MM, unit)} and ${formatLength(MAX_WALKWAY_MM, unit)}.`;
          onWalkway(mm);
          return null;
        }}
        hint={`${formatLength(900, unit)} is common practice for a main route (36 in in US codes: IRC R311.6, ADA §403.5.1). Beds, dining chairs and coffee tables need less, from published guidance.`}
      />

      {/* Announced politely and kept small: while a piece moves the list below is the last layout's. */}
      <p
        role="status"
        aria-live="polite"
        data-testid="fit-status"
        data-state={!result || result.pending ? 'checking' : 'checked'}
        data-check-ms={result ? Math.round(result.ms) : undefined}
        className="-mb-3 h-4 text-xs text-ink-faint"
      >
        {result?.pending ? 'Checking…' : ''}
      </p>
      {!result ? (
        <Spinner label="Checking the layout…" />
      ) : result.error ? (
        <Notice tone="error">The check could not run: {result.error}</Notice>
      ) : result.findings.length === 0 ? (
        <Notice tone="ok">Everything fits, with room to move.</Notice>
      ) : (
        <ol
          className={`flex flex-col gap-2 transition-opacity ${result.pending ? 'opacity-70' : ''}`}
          aria-label="Findings"
          aria-busy={result.pending}
        >
          {listed(result.findings, marks).map((row) => (
            <FindingItem
              key={row.key}
              row={row}
              title={KIND_TITLE[row.finding.kind]}
              unit={unit}
              selected={selected === row.index}
              onChoose={() => onChoose(selected === row.index ? null : row.index)}
              onMark={onMark}
              onUnmark={onUnmark}
              readOnly={readOnly}
            />
          ))}
        </ol>
      )}

      <div className="rounded-xl bg-sand p-4 text-sm text-ink-soft">
        <h3 className="mb-1 font-bold text-ink">Good to know</h3>
        <ul className="list-disc space-y-1 pl-4">
          <li>
            Clearances here are guidance. Local building codes and accessibility rules (for the edition in force) come first; ask
            a licensed professional where it matters.
          </li>
          <li>Keep the routes to doors and to escape windows clear — a bedroom needs a window you can get out of.</li>
          {tall.length > 0 && (
            <li>
              Fix tall pieces ({tall.map((p) => p.name).join(', ')}) to the wall so they cannot tip, and keep climbable furniture
              away from windows where children live.
            </li>
          )}
          <li>Never take out or alter a wall without a structural engineer and building-control approval.</li>
          <li>The plan and 3D are a visualisation, not a construction document: check dimensions on site before ordering.</li>
        </ul>
      </div>

      <div>
        <h3 className="mb-2 font-bold">Take-off</h3>
        <TakeoffTable shell={shell} />
      </div>
    </div>
  );
}
