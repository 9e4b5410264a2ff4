// The take-off table for one room's shell: floor area, perimeter, volume, net wall area, paint,
// flooring and skirting, then the walls one by one.
import { useMemo } from 'react';
import type { RoomShell } from '../../../../shared/schemas/room';
import { computeTakeoff } from '../../../../shared/analysis/takeoff';

const n = (v: number, digits = 2) => v.toLocaleString('en-GB', { minimumFractionDigits: digits, maximumFractionDigits: digits });

/** Quantities for the room's shell, from the same shared take-off the analyze command prints. */
export function TakeoffTable({ shell }: { shell: RoomShell }) {
  const t = useMemo(() => computeTakeoff(shell), [shell]);
  const rows: [string, string][] = [
    ['Floor area', `${n(t.floorAreaM2)} m²`],
    ['Perimeter', `${n(t.perimeterM)} m`],
    ['Volume', `${n(t.volumeM3, 1)} m³`],
    ['Net wall area', `${n(t.netWallAreaM2)} m²`],
    [`Paint (${t.paint.coats} coats at ${t.paint.coverageM2PerL} m²/L)`, `${n(t.paint.litres, 1)} L`],
    [`Flooring (+${t.flooring.wastePercent} % waste)`, `${n(t.flooring.orderAreaM2)} m²`],
    ['Skirting', `${n(t.skirtingM)} m`],
  ];
  return (
    <div>
      <table className="w-full text-[15px]">
        <tbody>
          {rows.map(([k, v]) => (
            <tr key={k} className="border-b border-line last:border-0">
              <th scope="row" className="py-2 pr-3 text-left font-normal text-ink-soft">
                {k}
              </th>
              <td className="py-2 text-right font-semibold tabular-nums">{v}</td>
            </tr>
          ))}
        </tbody>
      </table>
      <details className="mt-3 text-sm">
        <summary className="cursor-pointer font-semibold text-ink-soft">Walls one by one</summary>
        <table className="mt-2 w-full tabular-nums">
          <thead className="text-ink-faint">
            <tr>
              <th className="text-left font-normal">Wall</th>
              <th className="text-right font-normal">Length</th>
              <th className="text-right font-normal">Net area</th>
            </tr>
          </thead>
          <tbody>
            {t.walls.map((w) => (
              <tr key={w.index}>
                <td>{w.index + 1}</td>
                <td className="text-right">{n(w.lengthM)} m</td>
                <td className="text-right">{n(w.netAreaM2)} m²</td>
              </tr>
            ))}
          </tbody>
        </table>
      </details>
      <p className="mt-3 text-xs text-ink-faint">
        Measured on the inside faces. Paint coverage and flooring waste are common-practice defaults; the tin’s label and your
        fitter win.
      </p>
    </div>
  );
}
