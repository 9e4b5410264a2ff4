// The room editor's Furnish step: the catalogue to add pieces from, the holding area, and the
// selected piece's fields (name, size, turn, height above the floor, finishes, price, supplier, model,
// and for tall storage whether it is fixed to the wall).
import { useState } from 'react';
import { isTallStorage } from '../../../../shared/analysis/fit/safety';
import { isWebLink, type Piece } from '../../../../shared/schemas/option';
import type { RoomShell } from '../../../../shared/schemas/room';
import { CATALOGUE, CATALOGUE_GROUPS, pieceFromCatalogue, type CatalogueId } from '../../../../shared/catalogue/catalogue';
import {
  addPiece,
  duplicatePiece,
  holdPiece,
  placePiece,
  removePiece,
  resizePiece,
  rotatePiece,
  updatePiece,
  type Command,
} from '../../../../shared/commands';
import { formatLength, type LengthUnit } from '../../../../shared/units/length';
import { Button } from '../../../components/ui/button';
import { inputClass } from '../../../components/ui/field';
import { CommitTextField } from '../../../components/ui/commit-field';
import { numberParser, textParser, useCommitText, type Parsed } from '../../../components/ui/use-commit-text';
import type { FieldRun } from './outline-panel';
import { LengthField } from '../../../components/ui/length-field';
import { placedNear, type Selection } from './plan/plan-geometry';
import { KindDrawing, KindPicker } from './kind-drawing';
import { PieceModelField } from './piece-model-field';
import type { PieceModel } from '../../../../shared/schemas/piece-model';

const GROUP_LABEL: Record<(typeof CATALOGUE_GROUPS)[number], string> = {
  seating: 'Seating',
  tables: 'Tables',
  beds: 'Beds',
  storage: 'Storage',
  kitchen: 'Kitchen',
  lighting: 'Lighting',
  rugs: 'Rugs',
  other: 'Anything else',
};

function parseSupplierLink(text: string): Parsed<string | null> {
  const t = text.trim();
  if (t === '') return { ok: true, value: null };
  return isWebLink(t) ? { ok: true, value: t } : { ok: false, message: 'Paste a full link, starting with https://' };
}

/** Tall pieces can tip: at this height or more, the editor reminds the designer to fix them to the wall (common practice). */
export const TALL_PIECE_MM = 1200;

export function FurnishPanel({
  shell,
  optionId,
  pieces,
  run,
  commit,
  unit,
  readOnly,
  selection,
  onSelect,
  newId,
  viewCentre,
  models = [],
}: {
  shell: RoomShell;
  optionId: string;
  pieces: Piece[];
  run: (c: Command, o?: { gesture?: string }) => boolean;
  commit: FieldRun;
  unit: LengthUnit;
  readOnly: boolean;
  selection: Selection;
  onSelect: (s: Selection) => void;
  newId: (prefix: string) => string;
  /** Where added and placed pieces should land near: the middle of the plan's view of the room. */
  viewCentre: () => [number, number];
  /** The studio's piece models, for the selected piece to wear. */
  models?: PieceModel[];
}) {
  // Add and Hold select the new piece (the plan shows where it landed) but keep the catalogue
  // open, so several pieces go in one after another; any other selection opens the piece's fields.
  const [kept, setKept] = useState<Selection>(null);
  const selected = selection?.kind === 'piece' ? pieces.find((p) => p.id === selection.id) : undefined;
  if (selected && selection !== kept)
    return (
      <PieceProperties
        key={selected.id}
        piece={selected}
        shell={shell}
        pieces={pieces}
        viewCentre={viewCentre}
        optionId={optionId}
        run={run}
        commit={commit}
        unit={unit}
        readOnly={readOnly}
        onSelect={onSelect}
        newId={newId}
        models={models}
      />
    );
  return (
    <CatalogueList
      shell={shell}
      pieces={pieces}
      viewCentre={viewCentre}
      optionId={optionId}
      run={run}
      unit={unit}
      readOnly={readOnly}
      onSelect={onSelect}
      newId={newId}
      heldCount={pieces.filter((p) => !p.placed).length}
      added={selected && selection === kept ? selected : undefined}
      onAdded={setKept}
    />
  );
}

function CatalogueList({
  shell,
  pieces,
  viewCentre,
  optionId,
  run,
  unit,
  readOnly,
  onSelect,
  newId,
  heldCount,
  added,
  onAdded,
}: {
  shell: RoomShell;
  pieces: Piece[];
  viewCentre: () => [number, number];
  optionId: string;
  run: (c: Command) => boolean;
  unit: LengthUnit;
  readOnly: boolean;
  onSelect: (s: Selection) => void;
  newId: (prefix: string) => string;
  heldCount: number;
  /** The piece just added from this list, still selected. */
  added: Piece | undefined;
  onAdded: (s: Selection) => void;
}) {
  const [filter, setFilter] = useState('');
  const add = (kind: CatalogueId, held: boolean) => {
    const id = newId('piece');
    const piece = pieceFromCatalogue(kind, id, viewCentre());
    if (run(addPiece(optionId, held ? { ...piece, placed: false } : placedNear(shell, pieces, piece, viewCentre())))) {
      const s: Selection = { kind: 'piece', id };
      onSelect(s);
      onAdded(s);
    }
  };
  const shown = CATALOGUE.filter((e) => e.name.toLowerCase().includes(filter.trim().toLowerCase()));
  return (
    <div className="flex flex-col gap-4">
      <p className="text-sm text-ink-soft">
        Drag a piece onto the plan, or add it to the middle of the room. The holding area next to the room keeps pieces you are
        still finding a place for{heldCount > 0 ? ` (${heldCount} waiting)` : ''}.
      </p>
      <div aria-live="polite" className="min-h-0 empty:hidden">
        {added && (
          <div className="flex items-center justify-between gap-2 rounded-lg bg-pine/10 px-3 py-2 text-sm">
            <span className="min-w-0">{added.placed ? `Added ${added.name}.` : `${added.name} is in the holding area.`}</span>
            <button
              type="button"
              className="shrink-0 font-semibold text-pine hover:underline"
              onClick={() => onSelect({ kind: 'piece', id: added.id })}
              aria-label={`Edit ${added.name}`}
            >
              Edit it
            </button>
          </div>
        )}
      </div>
      <label>
        <span className="sr-only">Find in the catalogue</span>
        <input
          className={inputClass}
          type="search"
          placeholder="Find a piece, e.g. queen or wardrobe"
          value={filter}
          onChange={(e) => setFilter(e.target.value)}
        />
      </label>
      {CATALOGUE_GROUPS.map((group) => {
        const entries = shown.filter((e) => e.group === group);
        if (entries.length === 0) return null;
        return (
          <section key={group} aria-label={GROUP_LABEL[group]}>
            <h3 className="mb-1.5 text-xs font-bold tracking-wide text-ink-faint uppercase">{GROUP_LABEL[group]}</h3>
            <ul className="flex flex-col gap-1">
              {entries.map((e) => (
                <li
                  key={e.id}
                  draggable={!readOnly}
                  onDragStart={(ev) => {
                    ev.dataTransfer.setData('application/x-parlour-catalogue', e.id);
                    ev.dataTransfer.effectAllowed = 'copy';
                  }}
                  className={`group flex items-center gap-2 rounded-lg border border-line bg-white px-3 py-2 ${readOnly ? '' : 'cursor-grab hover:border-pine'}`}
                  title={`${e.source}${e.note ? ` · ${e.note}` : ''}`}
                >
                  <KindDrawing kind={e.kind} settings={e.settings} box={e} size={36} />
                  <div className="min-w-0 flex-1">
                    <div className="truncate text-sm font-semibold">{e.name}</div>
                    <div className="text-xs text-ink-faint tabular-nums">
                      {formatLength(e.width, unit)} × {formatLength(e.depth, unit)} · {formatLength(e.height, unit)} high
                    </div>
                  </div>
                  {!readOnly && (
                    <>
                      <Button
                        size="sm"
                        variant="quiet"
                        onClick={() => add(e.id as CatalogueId, true)}
                        aria-label={`Put a ${e.name} in the holding area`}
                        title="Put it in the holding area"
                      >
                        Hold
                      </Button>
                      <Button size="sm" onClick={() => add(e.id as CatalogueId, false)} aria-label={`Add ${e.name}`}>
                        Add
                      </Button>
                    </>
                  )}
                </li>
              ))}
            </ul>
          </section>
        );
      })}
    </div>
  );
}

function PieceProperties({
  piece,
  shell,
  pieces,
  viewCentre,
  optionId,
  run,
  commit,
  unit,
  readOnly,
  onSelect,
  newId,
  models,
}: {
  piece: Piece;
  shell: RoomShell;
  pieces: Piece[];
  viewCentre: () => [number, number];
  optionId: string;
  run: (c: Command) => boolean;
  commit: FieldRun;
  unit: LengthUnit;
  readOnly: boolean;
  onSelect: (s: Selection) => void;
  newId: (prefix: string) => string;
  models: PieceModel[];
}) {
  const patch = (p: Parameters<typeof updatePiece>[2]) => !readOnly && run(updatePiece(optionId, piece.id, p));
  const field = (p: Parameters<typeof updatePiece>[2]) => commit(updatePiece(optionId, piece.id, p));
  const size = (p: Parameters<typeof resizePiece>[2]) => commit(resizePiece(optionId, piece.id, p));
  const turn = useCommitText<number | null>({
    value: Math.round(piece.rotation * 10) / 10,
    format: (deg) => String(deg ?? ''),
    parse: numberParser({ what: 'a turn in degrees' }),
    onCommit: (deg) => commit(rotatePiece(optionId, piece.id, deg ?? 0)),
  });
  const turnBy = (deg: number) => !readOnly && run(rotatePiece(optionId, piece.id, piece.rotation + deg));

  return (
    <div className="flex flex-col gap-4">
      <div className="flex items-center justify-between gap-2">
        <button type="button" className="text-sm font-semibold text-pine hover:underline" onClick={() => onSelect(null)}>
          ← Catalogue
        </button>
        <span className="text-xs text-ink-faint">{piece.placed ? 'In the room' : 'In the holding area'}</span>
      </div>
      <CommitTextField
        label="Name"
        value={piece.name}
        format={(v) => v}
        parse={textParser('A piece needs a name.')}
        onCommit={(v) => field({ name: v })}
        disabled={readOnly}
      />
      <KindPicker
        kind={piece.kind ?? 'plain-block'}
        settings={piece.settings ?? {}}
        box={piece}
        readOnly={readOnly}
        onKind={(kind) => patch({ kind })}
        onSettings={(settings) =>
          patch({ settings: Object.values(settings).some((v) => v !== undefined) ? JSON.parse(JSON.stringify(settings)) : null })
        }
      />
      <div className="grid grid-cols-3 gap-2">
        <LengthField
          commit="blur"
          label="Width"
          unit={unit}
          valueMm={piece.width}
          disabled={readOnly}
          onChange={(v) => (v ? size({ width: v }) : 'Enter a width.')}
        />
        <LengthField
          commit="blur"
          label="Depth"
          unit={unit}
          valueMm={piece.depth}
          disabled={readOnly}
          onChange={(v) => (v ? size({ depth: v }) : 'Enter a depth.')}
        />
        <LengthField
          commit="blur"
          label="Height"
          unit={unit}
          valueMm={piece.height}
          disabled={readOnly}
          onChange={(v) => (v ? size({ height: v }) : 'Enter a height.')}
        />
      </div>
      <div className="grid grid-cols-2 gap-2">
        <div className="flex flex-col gap-1.5">
          <label htmlFor="piece-turn" className="text-sm font-semibold">
            Turn
          </label>
          <div className="flex items-center gap-1">
            <Button size="sm" onClick={() => turnBy(-15)} aria-label="Turn 15° anticlockwise" disabled={readOnly}>
              ↺
            </Button>
            <input
              id="piece-turn"
              className={`${inputClass} h-8 min-w-0 px-2 text-center`}
              inputMode="decimal"
              autoComplete="off"
              {...turn.inputProps}
              disabled={readOnly}
              aria-invalid={turn.error ? true : undefined}
              title={turn.error}
            />
            <Button size="sm" onClick={() => turnBy(15)} aria-label="Turn 15° clockwise" disabled={readOnly}>
              ↻
            </Button>
          </div>
        </div>
        <LengthField
          commit="blur"
          label="Above the floor"
          unit={unit}
          valueMm={piece.elevation}
          disabled={readOnly}
          onChange={(v) => (v !== null ? field({ elevation: v }) : 'Enter a height (0 stands on the floor).')}
        />
      </div>
      <fieldset className="flex flex-col gap-1.5">
        <legend className="text-sm font-semibold">The client</legend>
        <div className="flex gap-2">
          {(['existing', 'new'] as const).map((s) => (
            <label
              key={s}
              className={`flex flex-1 cursor-pointer items-center justify-center rounded-lg border px-3 py-2 text-sm font-semibold ${piece.status === s ? 'border-pine bg-pine-wash text-pine-dark' : 'border-line-strong bg-white'}`}
            >
              <input
                type="radio"
                className="sr-only"
                name="piece-status"
                checked={piece.status === s}
                disabled={readOnly}
                onChange={() => patch({ status: s })}
              />
              {s === 'existing' ? 'Already owns it' : 'New piece'}
            </label>
          ))}
        </div>
      </fieldset>
      <div className="grid grid-cols-[auto_1fr] items-start gap-3">
        <div className="flex gap-2">
          <label className="flex flex-col gap-1.5 text-sm font-semibold">
            Colour
            <input
              type="color"
              className="h-10 w-14 cursor-pointer rounded-lg border border-line-strong bg-white p-1"
              value={piece.colour ?? '#d9cfc0'}
              disabled={readOnly}
              onChange={(e) => patch({ colour: e.target.value })}
            />
          </label>
          <label className="flex flex-col gap-1.5 text-sm font-semibold" title="Legs, frame and handles">
            Accent
            <input
              type="color"
              className="h-10 w-14 cursor-pointer rounded-lg border border-line-strong bg-white p-1"
              value={piece.accentColour ?? '#8a7a68'}
              disabled={readOnly}
              onChange={(e) => patch({ accentColour: e.target.value })}
            />
          </label>
        </div>
        <CommitTextField
          label="Price"
          inputMode="decimal"
          value={piece.price ?? null}
          format={(v) => (v === null ? '' : String(v))}
          parse={numberParser({ what: 'a price', min: 0, optional: true })}
          onCommit={(v) => field({ price: v })}
          disabled={readOnly}
          hint="Per piece, your currency"
        />
      </div>
      <CommitTextField
        label="Supplier link"
        type="url"
        value={piece.supplierUrl ?? null}
        format={(v) => v ?? ''}
        parse={parseSupplierLink}
        onCommit={(v) => field({ supplierUrl: v })}
        disabled={readOnly}
      />
      {isTallStorage(piece) && (
        <label className="flex items-center gap-2 text-sm text-ink">
          <input
            type="checkbox"
            disabled={readOnly}
            checked={piece.fixedToWall === true}
            onChange={(e) => field({ fixedToWall: e.target.checked })}
          />
          Fixed to the wall
        </label>
      )}
      <PieceModelField piece={piece} models={models} optionId={optionId} run={run} unit={unit} readOnly={readOnly} />
      {piece.height >= TALL_PIECE_MM && (
        <p className="rounded-lg bg-ochre-wash px-3 py-2 text-sm text-ochre">
          A tall piece can tip over: fix it to the wall, especially where children live (see the furniture maker’s anchoring kit).
        </p>
      )}
      {!readOnly && (
        <div className="flex flex-wrap gap-2">
          <Button
            size="sm"
            onClick={() => {
              const id = newId('piece');
              if (run(duplicatePiece(optionId, piece.id, id))) onSelect({ kind: 'piece', id });
            }}
          >
            Duplicate
          </Button>
          {piece.placed ? (
            <Button size="sm" onClick={() => run(holdPiece(optionId, piece.id))}>
              Move to the holding area
            </Button>
          ) : (
            <Button
              size="sm"
              onClick={() => {
                const at = placedNear(shell, pieces, piece, viewCentre());
                run(placePiece(optionId, piece.id, at.x, at.y));
              }}
            >
              Place in the room
            </Button>
          )}
          <Button size="sm" variant="danger" onClick={() => run(removePiece(optionId, piece.id)) && onSelect(null)}>
            Remove
          </Button>
        </div>
      )}
    </div>
  );
}
