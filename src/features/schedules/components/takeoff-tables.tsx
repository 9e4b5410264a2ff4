// The take-off of one room and the project's totals, as tables of quantities per finish.
import type { ReactNode } from 'react';
import { describeTins } from '../../../../shared/analysis/tins';
import { surfaceLabel, type ProjectTakeoff, type RoomTakeoff } from '../../../../shared/analysis/finish-takeoff';
import { takeoffSettingsSchema } from '../../../../shared/analysis/takeoff-settings';
import { formatNumber } from './format';
import { NumberSetting } from './number-setting';
import { PaintChip } from './paint-chip';

const unitCoverageSchema = takeoffSettingsSchema.shape.unitCoverageM2.unwrap().valueType;

const th = 'py-2 pr-3 text-left text-xs font-semibold tracking-wide text-ink-faint uppercase';
const thNum = `${th} text-right`;
const td = 'py-2 pr-3 align-top';
const tdNum = `${td} text-right tabular-nums whitespace-nowrap`;

/** A table whose first two columns (name, where) keep the same widths in every take-off table, so they line up. */
export function QuantityTable({ label, head, children }: { label: string; head: ReactNode; children: ReactNode }) {
  return (
    <div className="overflow-x-auto">
      <table aria-label={label} className="w-full min-w-[40rem] table-fixed text-[15px]">
        <colgroup>
          <col className="w-[26%]" />
          <col className="w-[24%]" />
        </colgroup>
        <thead className="border-b border-line">
          <tr>{head}</tr>
        </thead>
        <tbody className="[&>tr]:border-b [&>tr]:border-line [&>tr:last-child]:border-0">{children}</tbody>
      </table>
    </div>
  );
}

/** One room's quantities; the m² per box or roll is typed here (kept in the browser, so every role may). */
export function RoomTakeoffTables({
  takeoff,
  roomName,
  onUnitCoverage,
}: {
  takeoff: RoomTakeoff;
  roomName: string;
  onUnitCoverage: (finishId: string, m2: number | null) => void;
}) {
  const { paints, coverings, missing, bare } = takeoff;
  return (
    <div className="flex flex-col gap-5">
      <dl className="grid grid-cols-2 gap-3 text-[15px] sm:grid-cols-4">
        <Figure label="Floor area" value={`${formatNumber(takeoff.floorAreaM2)} m²`} />
        <Figure label="Net wall area" value={`${formatNumber(takeoff.netWallAreaM2)} m²`} />
        <Figure label="Ceiling" value={`${formatNumber(takeoff.ceilingAreaM2)} m²`} />
        <Figure label="Skirting" value={`${formatNumber(takeoff.skirtingM)} m`} />
      </dl>

      <section>
        <h3 className="mb-1 font-bold">Paint by colour</h3>
        {paints.length === 0 ? (
          <p className="text-sm text-ink-soft">No paint in this option.</p>
        ) : (
          <QuantityTable
            label={`Paint in ${roomName}`}
            head={
              <>
                <th className={th}>Paint</th>
                <th className={th}>Where</th>
                <th className={thNum}>Area</th>
                <th className={thNum}>Litres</th>
                <th className={thNum}>Tins to buy</th>
              </>
            }
          >
            {paints.map((p) => (
              <tr key={p.finishId}>
                <td className={td}>
                  <span className="flex items-center gap-2 font-semibold">
                    <PaintChip colourHex={p.finish.colourHex} />
                    {p.finish.name}
                  </span>
                </td>
                <td className={`${td} text-ink-soft`}>{surfaceLabel(p.surfaces)}</td>
                <td className={tdNum}>{formatNumber(p.areaM2)} m²</td>
                <td className={tdNum}>{formatNumber(p.litres)} L</td>
                <td className={tdNum}>{describeTins(p.tins)}</td>
              </tr>
            ))}
          </QuantityTable>
        )}
      </section>

      <section>
        <h3 className="mb-1 font-bold">Flooring and other finishes</h3>
        {coverings.length === 0 ? (
          <p className="text-sm text-ink-soft">No photo finish in this option.</p>
        ) : (
          <QuantityTable
            label={`Flooring and other finishes in ${roomName}`}
            head={
              <>
                <th className={th}>Finish</th>
                <th className={th}>Where</th>
                <th className={thNum}>Area</th>
                <th className={thNum}>With waste</th>
                <th className={`${th} w-40`}>
                  Box or roll <span className="normal-case">(m²)</span>
                </th>
                <th className={thNum}>Boxes or rolls</th>
              </>
            }
          >
            {coverings.map((c) => (
              <tr key={c.finishId}>
                <td className={`${td} font-semibold`}>{c.finish.name}</td>
                <td className={`${td} text-ink-soft`}>{surfaceLabel(c.surfaces)}</td>
                <td className={tdNum}>{formatNumber(c.areaM2)} m²</td>
                <td className={tdNum}>{formatNumber(c.orderAreaM2)} m²</td>
                <td className="py-1 pr-3 align-top">
                  <NumberSetting
                    label={`m² per box or roll of ${c.finish.name}`}
                    className="[&>label]:sr-only"
                    value={c.unitCoverageM2}
                    schema={unitCoverageSchema}
                    emptyMeans="none"
                    onChange={(m2) => onUnitCoverage(c.finishId, m2)}
                  />
                </td>
                <td className={tdNum}>{c.units === null ? '—' : formatNumber(c.units)}</td>
              </tr>
            ))}
          </QuantityTable>
        )}
      </section>

      {(missing.length > 0 || bare.floorOrderM2 > 0 || bare.wallsM2 > 0) && (
        <ul className="flex flex-col gap-1 text-sm text-ink-soft">
          {missing.map((m) => (
            <li key={m.finishId}>
              {surfaceLabel(m.surfaces)}: the finish chosen is no longer in the library ({formatNumber(m.areaM2)} m²).
            </li>
          ))}
          {bare.floorOrderM2 > 0 && (
            <li>No floor finish chosen yet: {formatNumber(bare.floorOrderM2)} m² to order with waste.</li>
          )}
          {bare.wallsM2 > 0 && <li>Walls without a finish: {formatNumber(bare.wallsM2)} m² net.</li>}
        </ul>
      )}
    </div>
  );
}

function Figure({ label, value }: { label: string; value: string }) {
  return (
    <div className="rounded-xl bg-paper px-3 py-2">
      <dt className="text-xs text-ink-faint">{label}</dt>
      <dd className="font-semibold tabular-nums">{value}</dd>
    </div>
  );
}

export function ProjectTotals({ totals }: { totals: ProjectTakeoff }) {
  return (
    <div className="flex flex-col gap-5">
      <dl className="grid grid-cols-2 gap-3 text-[15px] sm:grid-cols-4">
        <Figure label="Floor area, all rooms" value={`${formatNumber(totals.floorAreaM2)} m²`} />
        <Figure label="Skirting, all rooms" value={`${formatNumber(totals.skirtingM)} m`} />
      </dl>
      {totals.paints.length > 0 && (
        <QuantityTable
          label="Paint for the project"
          head={
            <>
              <th className={th}>Paint</th>
              <th className={th}>Rooms</th>
              <th className={thNum}>Litres</th>
              <th className={thNum}>Tins to buy</th>
            </>
          }
        >
          {totals.paints.map((p) => (
            <tr key={p.finish.id}>
              <td className={td}>
                <span className="flex items-center gap-2 font-semibold">
                  <PaintChip colourHex={p.finish.colourHex} />
                  {p.finish.name}
                </span>
              </td>
              <td className={`${td} text-ink-soft`}>{p.rooms.join(', ')}</td>
              <td className={tdNum}>{formatNumber(p.litres)} L</td>
              <td className={tdNum}>{describeTins(p.tins)}</td>
            </tr>
          ))}
        </QuantityTable>
      )}
      {totals.coverings.length > 0 && (
        <QuantityTable
          label="Flooring and other finishes for the project"
          head={
            <>
              <th className={th}>Finish</th>
              <th className={th}>Rooms</th>
              <th className={thNum}>To order</th>
              <th className={thNum}>Boxes or rolls</th>
            </>
          }
        >
          {totals.coverings.map((c) => (
            <tr key={c.finish.id}>
              <td className={`${td} font-semibold`}>{c.finish.name}</td>
              <td className={`${td} text-ink-soft`}>{c.rooms.join(', ')}</td>
              <td className={tdNum}>{formatNumber(c.orderAreaM2)} m²</td>
              <td className={tdNum}>{c.units === null ? '—' : formatNumber(c.units)}</td>
            </tr>
          ))}
        </QuantityTable>
      )}
    </div>
  );
}
