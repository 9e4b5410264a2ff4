// The card for a piece the client tapped in the walk-through: name, size, finish and, when shown, price.
import { useEffect } from 'react';
import type { ClientPiece } from '../../../../shared/schemas/presentation';
import { Button } from '../../../components/ui/button';
import type { MoneySettings } from '../../../../shared/units/money';
import { elevationText, pieceName, pieceSizeText, priceText } from './wording';

/** What a tapped piece is: its name, size, finish and, when the designer shows prices, its price. */
export function PieceCard({
  piece,
  showPrices,
  money,
  onClose,
}: {
  piece: ClientPiece;
  showPrices: boolean;
  money: MoneySettings;
  onClose: () => void;
}) {
  // Escape closes the details, unless a dialog is open (it takes Escape for itself).
  useEffect(() => {
    const onKey = (e: KeyboardEvent) => {
      if (e.key === 'Escape' && !document.querySelector('dialog[open]')) onClose();
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, [onClose]);
  const rows: { term: string; value: React.ReactNode }[] = [
    {
      term: 'Size',
      value: (
        <>
          {pieceSizeText(piece)} <span className="text-ink-faint">(width × depth × height)</span>
        </>
      ),
    },
  ];
  if (piece.elevation > 0) rows.push({ term: 'Hangs', value: elevationText(piece.elevation) });
  if (piece.finish) {
    rows.push({
      term: 'Finish',
      value: (
        <span className="inline-flex items-center gap-2">
          {piece.finish.colourHex && (
            <span
              className="size-4 rounded border border-line-strong"
              style={{ background: piece.finish.colourHex }}
              aria-hidden
            />
          )}
          {piece.finish.name}
        </span>
      ),
    });
  }
  if (showPrices && piece.price != null) rows.push({ term: 'Price', value: priceText(piece.price, money) });
  return (
    <div aria-live="polite" className="rounded-xl bg-paper p-4">
      <div className="flex items-start justify-between gap-3">
        <div>
          <h3 className="font-bold">{pieceName(piece)}</h3>
          <p className="text-sm text-ink-soft">{piece.status === 'existing' ? 'Something you already have' : 'A new piece'}</p>
        </div>
        <Button size="sm" variant="quiet" onClick={onClose} aria-label="Close the piece details">
          Close
        </Button>
      </div>
      <dl className="mt-3 flex flex-col gap-1.5 text-[15px]">
        {rows.map((r) => (
          <div key={r.term} className="grid grid-cols-[4.5rem_1fr] gap-2">
            <dt className="text-ink-faint">{r.term}</dt>
            <dd>{r.value}</dd>
          </div>
        ))}
      </dl>
    </div>
  );
}
