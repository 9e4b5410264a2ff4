// The swatch of a finish: its processed picture, its paint colour, or a note while it is being
// processed or could not be.
import type { Finish } from '../../../../shared/schemas/finish';

/** The small square picture of a finish: the processed swatch, the paint colour, or where it stands. */
export function Swatch({ finish, className = '' }: { finish: Finish; className?: string }) {
  const frame = `relative aspect-square overflow-hidden rounded-xl border border-line ${className}`;
  if (finish.kind === 'paint') {
    return (
      <div className={frame} style={{ backgroundColor: finish.colourHex }} role="img" aria-label={`Colour ${finish.colourHex}`} />
    );
  }
  if (finish.status === 'ready' && finish.files.swatchUrl) {
    return (
      <div className={frame} style={{ backgroundColor: finish.meanColourHex ?? undefined }}>
        <img src={finish.files.swatchUrl} alt={`Swatch of ${finish.name}`} className="size-full object-cover" loading="lazy" />
      </div>
    );
  }
  return (
    <div
      className={`${frame} flex items-center justify-center bg-sand text-sm font-medium ${finish.status === 'failed' ? 'text-clay' : 'text-ink-soft'}`}
    >
      {finish.status === 'failed' ? (
        'Could not be processed'
      ) : (
        <span className="flex items-center gap-2">
          <span className="size-3.5 animate-spin rounded-full border-2 border-pine border-t-transparent" aria-hidden />
          Processing…
        </span>
      )}
    </div>
  );
}
