// The room editor's Finishes step: pick a surface (floor, ceiling, walls, feature walls or a
// piece's main or accent finish) and give it a finish from the library.
import { useState } from 'react';
import { Link } from 'react-router';
import type { Finish } from '../../../../shared/schemas/finish';
import type { OptionDoc, Piece } from '../../../../shared/schemas/option';
import { assignFinish, updatePiece, type Command, type FinishSurface } from '../../../../shared/commands';
import { inputClass } from '../../../components/ui/field';
import type { Selection } from './plan/plan-geometry';

type Target = 'floor' | 'ceiling' | 'walls' | 'wall' | 'piece';

/** The surface a click on the plan or in 3D chose, as this panel names it. */
export function targetOf(selection: Selection): Target | null {
  if (selection?.kind === 'wall') return 'wall';
  if (selection?.kind === 'piece') return 'piece';
  return null;
}

export function FinishesPanel({
  doc,
  optionId,
  finishes,
  run,
  readOnly,
  selection,
  onSelect,
  surface,
  onSurface,
}: {
  doc: OptionDoc;
  optionId: string;
  finishes: Finish[];
  run: (c: Command) => boolean;
  readOnly: boolean;
  selection: Selection;
  onSelect: (s: Selection) => void;
  surface: Target;
  onSurface: (t: Target) => void;
}) {
  const [q, setQ] = useState('');
  // A piece wears two finishes: the main one (upholstery, carcass, top) and the accent (legs, frame, handles).
  const [pieceSlot, setPieceSlot] = useState<'main' | 'accent'>('main');
  const byId = new Map(finishes.map((f) => [f.id, f]));
  const wall = selection?.kind === 'wall' ? selection.index : null;
  const piece: Piece | undefined = selection?.kind === 'piece' ? doc.pieces.find((p) => p.id === selection.id) : undefined;

  const currentId = (t: Target): string | null => {
    if (t === 'floor') return doc.finishes.floor;
    if (t === 'ceiling') return doc.finishes.ceiling;
    if (t === 'walls') return doc.finishes.walls;
    if (t === 'wall') return wall === null ? null : (doc.finishes.wallOverrides[String(wall)] ?? null);
    return (pieceSlot === 'accent' ? piece?.accentFinishId : piece?.finishId) ?? null;
  };
  const choose = (id: string | null) => {
    if (readOnly) return;
    if (surface === 'piece') {
      if (piece) run(updatePiece(optionId, piece.id, pieceSlot === 'accent' ? { accentFinishId: id } : { finishId: id }));
      return;
    }
    const s: FinishSurface | null = surface === 'wall' ? (wall === null ? null : { wall }) : surface;
    if (s !== null) run(assignFinish(optionId, s, id));
  };

  const pieceColour = pieceSlot === 'accent' ? piece?.accentColour : piece?.colour;
  const targets: { id: Target; label: string; disabled?: boolean }[] = [
    { id: 'floor', label: 'Floor' },
    { id: 'walls', label: 'All walls' },
    { id: 'wall', label: wall === null ? 'One wall (click it)' : `Wall ${wall + 1} (feature wall)`, disabled: wall === null },
    { id: 'ceiling', label: 'Ceiling' },
    { id: 'piece', label: piece ? piece.name : 'A piece (click it)', disabled: !piece },
  ];
  // Feature walls are listed from the start, not only once their wall is clicked.
  const featureWalls = Object.entries(doc.finishes.wallOverrides)
    .map(([index, id]) => ({ index: Number(index), finish: byId.get(id) }))
    .filter((w) => Number.isInteger(w.index))
    .sort((a, b) => a.index - b.index);
  const shown = finishes.filter(
    (f) => f.name.toLowerCase().includes(q.trim().toLowerCase()) && (f.kind === 'paint' || f.status !== 'failed'),
  );

  return (
    <div className="flex flex-col gap-4">
      <p className="text-sm text-ink-soft">
        Choose a surface, then a finish. Click a wall or a piece on the plan, or a surface in the 3D view. Each option keeps its
        own finishes.
      </p>
      <div role="radiogroup" aria-label="Surface" className="flex flex-col gap-1">
        {targets.map((t) => {
          const assigned = currentId(t.id) ? byId.get(currentId(t.id)!) : undefined;
          return (
            <button
              key={t.id}
              type="button"
              role="radio"
              aria-checked={surface === t.id}
              disabled={t.disabled}
              onClick={() => onSurface(t.id)}
              className="flex items-center gap-2 rounded-lg border border-line bg-white px-3 py-2 text-left text-sm disabled:text-ink-faint aria-checked:border-pine aria-checked:bg-pine-wash/60"
            >
              <span className="flex-1 font-semibold">{t.label}</span>
              {assigned ? (
                <Swatch finish={assigned} size="sm" />
              ) : t.id === 'piece' && pieceColour ? (
                <span className="block size-6 rounded border border-black/10" style={{ background: pieceColour }} />
              ) : null}
              <span className="max-w-28 truncate text-xs text-ink-soft">
                {assigned?.name ??
                  (t.id === 'wall' && wall !== null ? 'as all walls' : t.id === 'piece' && pieceColour ? 'own colour' : 'plain')}
              </span>
            </button>
          );
        })}
      </div>

      <section aria-labelledby="feature-walls-title">
        <h3 id="feature-walls-title" className="mb-1.5 text-xs font-bold tracking-wide text-ink-faint uppercase">
          Feature walls
        </h3>
        {featureWalls.length === 0 ? (
          <p className="text-sm text-ink-soft">None: every wall wears the finish of all walls.</p>
        ) : (
          <ul className="flex flex-col gap-1">
            {featureWalls.map((w) => (
              <li key={w.index}>
                <button
                  type="button"
                  aria-pressed={surface === 'wall' && wall === w.index}
                  onClick={() => onSelect({ kind: 'wall', index: w.index })}
                  className="flex w-full items-center gap-2 rounded-lg border border-line bg-white px-3 py-1.5 text-left text-sm hover:border-pine aria-pressed:border-pine aria-pressed:bg-pine-wash/60"
                >
                  <span className="flex-1 font-semibold">Wall {w.index + 1}</span>
                  {w.finish && <Swatch finish={w.finish} size="sm" />}
                  <span className="max-w-28 truncate text-xs text-ink-soft">
                    {w.finish?.name ?? 'a finish no longer in the library'}
                  </span>
                </button>
              </li>
            ))}
          </ul>
        )}
      </section>

      {surface === 'piece' && piece && (
        <div role="radiogroup" aria-label="Which finish of the piece" className="flex gap-2">
          {(['main', 'accent'] as const).map((slot) => (
            <button
              key={slot}
              type="button"
              role="radio"
              aria-checked={pieceSlot === slot}
              onClick={() => setPieceSlot(slot)}
              className="flex-1 rounded-lg border border-line bg-white px-3 py-1.5 text-sm font-semibold aria-checked:border-pine aria-checked:bg-pine-wash/60"
            >
              {slot === 'main' ? 'Main' : 'Accent: legs, frame, handles'}
            </button>
          ))}
        </div>
      )}
      <label>
        <span className="sr-only">Find a finish</span>
        <input
          className={inputClass}
          type="search"
          placeholder="Find a finish"
          value={q}
          onChange={(e) => setQ(e.target.value)}
        />
      </label>
      {finishes.length === 0 ? (
        <p className="text-sm text-ink-soft">
          The studio has no finishes yet.{' '}
          <Link to="/finishes" className="font-semibold text-pine underline">
            Add photos and paints in the Finish library
          </Link>
          .
        </p>
      ) : (
        <ul className="grid grid-cols-3 gap-2" aria-label="Finishes">
          {!readOnly && (
            <li>
              <button
                type="button"
                onClick={() => choose(null)}
                aria-pressed={currentId(surface) === null}
                className="flex h-full w-full flex-col items-center gap-1 rounded-lg border border-dashed border-line-strong p-2 text-xs text-ink-soft hover:border-pine aria-pressed:border-pine"
              >
                <span className="flex aspect-square w-full items-center justify-center rounded bg-paper">—</span>
                Plain
              </button>
            </li>
          )}
          {shown.map((f) => (
            <li key={f.id}>
              <button
                type="button"
                disabled={readOnly}
                aria-pressed={currentId(surface) === f.id}
                onClick={() => choose(f.id)}
                title={
                  f.kind === 'photo'
                    ? `${f.name}: repeats every ${f.repeatWidthMm / 10} × ${f.repeatHeightMm / 10} cm`
                    : `${f.name}: paint, ${f.sheen}`
                }
                className="flex w-full flex-col items-center gap-1 rounded-lg border border-line bg-white p-2 text-xs hover:border-pine aria-pressed:border-pine aria-pressed:ring-2 aria-pressed:ring-pine"
              >
                <Swatch finish={f} />
                <span className="w-full truncate text-center">{f.name}</span>
              </button>
            </li>
          ))}
        </ul>
      )}
      {(selection?.kind === 'wall' || selection?.kind === 'piece') && (
        <button
          type="button"
          className="self-start text-sm font-semibold text-pine hover:underline"
          onClick={() => {
            onSelect(null);
            onSurface('floor');
          }}
        >
          Clear the selection
        </button>
      )}
    </div>
  );
}

function Swatch({ finish, size = 'md' }: { finish: Finish; size?: 'sm' | 'md' }) {
  const cls = size === 'sm' ? 'size-6 rounded' : 'aspect-square w-full rounded';
  if (finish.kind === 'paint')
    return <span className={`${cls} block border border-black/10`} style={{ background: finish.colourHex }} />;
  if (finish.files.swatchUrl) return <img src={finish.files.swatchUrl} alt="" className={`${cls} object-cover`} />;
  return <span className={`${cls} block`} style={{ background: finish.meanColourHex ?? '#c8c2b8' }} />;
}
