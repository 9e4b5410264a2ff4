// One option's schedule: every piece and finish with quantities, prices and totals; a CSV download
// and a print view (the app's top bar and these buttons are left off paper).
import { Fragment } from 'react';
import { Link } from 'react-router';
import { QUANTITY_UNIT_LABELS, type ScheduleLine } from '../../../../shared/analysis/schedule-lines';
import { pieceSizeText } from '../../../../shared/units/piece-size';
import { Button } from '../../../components/ui/button';
import { Badge, PageHeader, Spinner } from '../../../components/ui/layout';
import { scheduleCsvUrl, settingsQuery, useSchedule } from '../api/schedules';
import { useTakeoffSettings } from '../hooks/use-takeoff-settings';
import { formatQuantity, useFormatMoney } from './format';
import { useMoney, useSession } from '../../../lib/session';
import { PaintChip } from './paint-chip';
import { LoadError } from './load-error';

const th = 'py-2 pr-3 text-left text-xs font-semibold tracking-wide text-ink-faint uppercase';
const thNum = `${th} text-right`;
const td = 'py-2.5 pr-3 align-top';
const tdNum = `${td} text-right tabular-nums whitespace-nowrap`;

export function SchedulePage({ projectId, optionId }: { projectId: string; optionId: string }) {
  const formatMoney = useFormatMoney();
  const money = useMoney();
  const studioName = useSession().data?.studio.name ?? '';
  const printedOn = new Intl.DateTimeFormat(money.locale, { day: 'numeric', month: 'long', year: 'numeric' }).format(new Date());
  const { settings } = useTakeoffSettings(projectId);
  const query = settingsQuery(settings);
  const schedule = useSchedule(optionId, query);

  if (schedule.isPending) return <Spinner label="Loading the schedule…" />;
  if (schedule.isError) return <LoadError error={schedule.error} projectId={projectId} />;
  const { project, room, option, schedule: s, client } = schedule.data;
  const pieces = s.lines.filter((l) => l.section === 'piece');
  const finishes = s.lines.filter((l) => l.section === 'finish');

  return (
    <article>
      {/* On paper the schedule says whose it is and when it was printed. */}
      <header className="mb-4 hidden border-b border-ink pb-3 text-sm print:block" data-testid="print-header">
        <p className="text-base font-bold">{studioName}</p>
        <p>{[client && `For ${client.name}`, project.name, room.name, option.label].filter(Boolean).join(' · ')}</p>
        <p>Printed {printedOn}</p>
      </header>
      <PageHeader
        eyebrow={
          <>
            <Link to={`/projects/${projectId}`} className="hover:text-ink hover:underline">
              {project.name}
            </Link>{' '}
            /{' '}
            <Link to={`/projects/${projectId}/rooms/${room.id}`} className="hover:text-ink hover:underline">
              {room.name}
            </Link>
          </>
        }
        title={`Schedule · ${option.label}`}
        actions={
          <div className="no-print flex flex-wrap gap-2">
            <Link
              to={`/projects/${projectId}/take-off`}
              className="inline-flex h-10 items-center rounded-lg px-4 text-[15px] font-semibold text-ink-soft hover:bg-sand hover:text-ink"
            >
              Take-off and comparison
            </Link>
            <a
              href={scheduleCsvUrl(optionId, query)}
              download
              className="inline-flex h-10 items-center rounded-lg border border-line-strong bg-white px-4 text-[15px] font-semibold hover:bg-sand"
            >
              Download CSV
            </a>
            <Button variant="primary" onClick={() => window.print()}>
              Print
            </Button>
          </div>
        }
      >
        {option.note && <span className="block">{option.note}</span>}
        <span className="text-sm">
          {settings.coats} coats at {settings.coverageM2PerL} m² per litre · flooring +{settings.wastePercent} % waste
        </span>
      </PageHeader>

      <div className="flex flex-col gap-8 rounded-2xl border border-line bg-white p-6 print:border-0 print:p-0">
        <LineTable title="Pieces" lines={pieces} empty="No pieces placed in this option." />
        <LineTable title="Finishes" lines={finishes} empty="No finishes chosen for this option." />

        <section aria-label="Totals" className="ml-auto w-full max-w-sm break-inside-avoid">
          <dl className="text-[15px]">
            <Total label="New pieces" value={s.totals.newPiecesCost} />
            <Total label="Finishes" value={s.totals.finishesCost} />
            <div className="mt-1 flex justify-between border-t-2 border-ink py-2 text-lg font-bold">
              <dt>Budget</dt>
              <dd className="tabular-nums" data-testid="budget">
                {formatMoney(s.totals.budget)}
              </dd>
            </div>
          </dl>
          <p className="text-sm text-ink-soft">
            {s.totals.newPieceCount} new piece{s.totals.newPieceCount === 1 ? '' : 's'}, {s.totals.existingPieceCount} the client
            already owns (at no cost).
          </p>
        </section>

        <div className="flex flex-col gap-1 text-sm text-ink-faint">
          {s.totals.unpricedCount > 0 && (
            <p className="font-medium text-ochre">
              {s.totals.unpricedCount} line{s.totals.unpricedCount === 1 ? ' has' : 's have'} no price yet and{' '}
              {s.totals.unpricedCount === 1 ? 'is' : 'are'} left out of the budget.
            </p>
          )}
          {s.heldPieceCount > 0 && (
            <p>
              {s.heldPieceCount} piece{s.heldPieceCount === 1 ? '' : 's'} in the holding area{' '}
              {s.heldPieceCount === 1 ? 'is' : 'are'} not counted.
            </p>
          )}
          <p>
            Quantities are measured on the inside faces with common-practice allowances; check on site before ordering. Prices are
            in the studio’s currency, {money.currency}.
          </p>
        </div>
      </div>
    </article>
  );
}

function Total({ label, value }: { label: string; value: number }) {
  const formatMoney = useFormatMoney();
  return (
    <div className="flex justify-between py-1">
      <dt className="text-ink-soft">{label}</dt>
      <dd className="font-semibold tabular-nums">{formatMoney(value)}</dd>
    </div>
  );
}

function LineTable({ title, lines, empty }: { title: string; lines: ScheduleLine[]; empty: string }) {
  return (
    <section>
      <h2 className="mb-2 text-lg font-bold">{title}</h2>
      {lines.length === 0 ? (
        <p className="text-ink-soft">{empty}</p>
      ) : (
        <table aria-label={title} className="w-full table-fixed text-[15px] print:text-[12px]">
          {/* The same columns in both tables, so pieces and finishes line up one under the other. */}
          <colgroup>
            <col className="w-[25%]" />
            <col className="w-[21%]" />
            <col className="w-[16%]" />
            <col className="w-[11%]" />
            <col className="w-[11%]" />
            <col className="w-[16%]" />
          </colgroup>
          <thead className="border-b border-line-strong">
            <tr>
              <th className={th}>Item</th>
              <th className={th}>{title === 'Pieces' ? 'Size' : 'Where'}</th>
              <th className={thNum}>Quantity</th>
              <th className={thNum}>Unit price</th>
              <th className={thNum}>Total</th>
              <th className={`${th} pr-0`}>Supplier</th>
            </tr>
          </thead>
          <tbody className="[&>tr]:border-b [&>tr]:border-line [&>tr]:break-inside-avoid">
            {lines.map((l) => (
              <Line key={l.key} line={l} />
            ))}
          </tbody>
        </table>
      )}
    </section>
  );
}

function Line({ line: l }: { line: ScheduleLine }) {
  const formatMoney = useFormatMoney();
  return (
    <tr>
      <td className={td}>
        <span className="flex flex-wrap items-center gap-2 font-semibold">
          {l.colourHex && <PaintChip colourHex={l.colourHex} />}
          {l.name}
          {l.status && <Badge value={l.status} />}
        </span>
        {l.code && <span className="block text-[0.9em] text-ink-faint">{l.code}</span>}
      </td>
      <td className={`${td} text-ink-soft`}>
        {l.sizeMm ? pieceSizeText(l.sizeMm) : l.detail}
        {l.sizeMm && l.detail && <span className="block text-[0.9em]">{l.detail}</span>}
      </td>
      <td className={tdNum}>
        {formatQuantity(l.quantity, l.quantityUnit)}
        {l.quantityNote && <span className="block text-[0.8em] whitespace-normal text-ink-faint">{l.quantityNote}</span>}
      </td>
      <td className={tdNum}>
        {l.unitPrice === null || !l.priceUnit
          ? '—'
          : `${formatMoney(l.unitPrice)}${l.priceUnit === 'piece' ? '' : ` / ${QUANTITY_UNIT_LABELS[l.priceUnit]}`}`}
      </td>
      <td className={`${tdNum} font-semibold`}>
        {l.status === 'existing' ? (
          <span className="font-normal text-ink-soft">no cost</span>
        ) : l.total === null ? (
          <span className="font-normal text-ochre" title={l.unpricedReason ?? undefined}>
            no price
          </span>
        ) : (
          formatMoney(l.total)
        )}
        {l.total === null && l.unpricedReason && (
          <span className="block text-[0.8em] font-normal whitespace-normal text-ink-faint">{l.unpricedReason}</span>
        )}
      </td>
      <td className={`${td} pr-0 text-[0.9em]`}>
        {l.supplier && <span className="block">{l.supplier}</span>}
        {l.supplierUrl && (
          <a
            href={l.supplierUrl}
            target="_blank"
            rel="noreferrer noopener"
            className="break-words text-pine hover:underline print:text-ink"
          >
            {linkParts(l.supplierUrl).map((part, i) => (
              <Fragment key={i}>
                {i > 0 && <wbr />}
                {part}
              </Fragment>
            ))}
          </a>
        )}
        {!l.supplier && !l.supplierUrl && <span className="text-ink-faint">—</span>}
      </td>
    </tr>
  );
}

/** The address without its scheme, short enough for a column and still readable on paper. */
function linkText(url: string): string {
  return url.replace(/^https?:\/\//, '').replace(/\/$/, '');
}

/** The address in pieces that may end a line: after a slash, dot, hyphen or query mark, never inside a word. */
export function linkParts(url: string): string[] {
  return linkText(url).split(/(?<=[/.?&=_-])/);
}
