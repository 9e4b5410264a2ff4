// The comparison table for one room: its options side by side, one column per option, one row per figure.
import { Link } from 'react-router';
import type { CompareAnswer } from '../../../../shared/schemas/schedule-api';
import { Badge } from '../../../components/ui/layout';
import { formatNumber, useFormatMoney } from './format';

type CompareRoom = CompareAnswer['rooms'][number];

const rowHead = 'py-2 pr-4 text-left font-normal text-ink-soft whitespace-nowrap';
const cell = 'py-2 px-3 text-right tabular-nums';

/** One room's options side by side: one column per option, one row per figure. */
export function CompareTable({ projectId, room }: { projectId: string; room: CompareRoom }) {
  const formatMoney = useFormatMoney();
  const anyChoice = room.chosenOptionId !== null;
  return (
    <div className="overflow-x-auto">
      <table aria-label={`Options for ${room.name}`} className="w-full text-[15px]">
        <thead>
          <tr className="border-b border-line">
            <th className="py-2 pr-4 text-left text-xs font-semibold tracking-wide text-ink-faint uppercase">{room.name}</th>
            {room.options.map((o) => (
              <th key={o.id} scope="col" className={`px-3 py-2 text-right align-bottom ${o.chosen ? 'bg-pine-wash/60' : ''}`}>
                <span className="block font-bold text-ink">{o.label}</span>
                <Link
                  to={`/projects/${projectId}/rooms/${room.id}/options/${o.id}/schedule`}
                  className="text-sm font-semibold text-pine hover:underline"
                >
                  Schedule
                </Link>
              </th>
            ))}
          </tr>
        </thead>
        <tbody className="[&>tr]:border-b [&>tr]:border-line [&>tr:last-child]:border-0">
          <tr>
            <th scope="row" className={rowHead}>
              Budget
            </th>
            {room.options.map((o) => (
              <td key={o.id} className={`${cell} font-semibold ${o.chosen ? 'bg-pine-wash/60' : ''}`}>
                {formatMoney(o.budget)}
                {o.unpricedCount > 0 && (
                  <span className="block text-xs font-normal text-ochre">{o.unpricedCount} without a price</span>
                )}
              </td>
            ))}
          </tr>
          <tr>
            <th scope="row" className={rowHead}>
              New pieces
            </th>
            {room.options.map((o) => (
              <td key={o.id} className={`${cell} ${o.chosen ? 'bg-pine-wash/60' : ''}`}>
                {o.newPieceCount}
              </td>
            ))}
          </tr>
          <tr>
            <th scope="row" className={rowHead}>
              Fit check findings
            </th>
            {room.options.map((o) => {
              const open = o.findingCount - o.seenFindingCount;
              return (
                <td key={o.id} className={`${cell} ${open > 0 ? 'text-clay' : ''} ${o.chosen ? 'bg-pine-wash/60' : ''}`}>
                  {o.findingCount === 0 ? (
                    'None'
                  ) : o.seenFindingCount === 0 ? (
                    o.findingCount
                  ) : (
                    <>
                      {open} open <span className="text-ink-faint">· {o.seenFindingCount} seen</span>
                    </>
                  )}
                </td>
              );
            })}
          </tr>
          <tr>
            <th scope="row" className={rowHead}>
              Free floor
            </th>
            {room.options.map((o) => (
              <td key={o.id} className={`${cell} ${o.chosen ? 'bg-pine-wash/60' : ''}`}>
                {formatNumber(o.freeFloorPercent)} %
              </td>
            ))}
          </tr>
          <tr>
            <th scope="row" className={rowHead}>
              Client’s choice
            </th>
            {room.options.map((o) => (
              <td key={o.id} className={`${cell} ${o.chosen ? 'bg-pine-wash/60' : ''}`}>
                {o.chosen ? (
                  <Badge value="decided" label="Chosen" />
                ) : (
                  <span className="text-ink-faint">{anyChoice ? '—' : 'Not yet'}</span>
                )}
              </td>
            ))}
          </tr>
        </tbody>
      </table>
    </div>
  );
}
