/** A paint's colour as a small round chip beside its name (decorative: the name says the colour). */
export function PaintChip({ colourHex }: { colourHex: string }) {
  return (
    <span
      aria-hidden
      className="inline-block size-4 shrink-0 rounded-full border border-line-strong align-[-3px] print:border-ink"
      style={{ backgroundColor: colourHex }}
    />
  );
}
