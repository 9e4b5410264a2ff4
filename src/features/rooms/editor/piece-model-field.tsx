// The Furnish step's "Model" for the selected piece: choose a ready model from the studio's library
// (or none), the choice between the model's size and fitting it into the box when they differ, and
// whether the model wears the piece's finishes. Every change is an editor command, so Undo takes it back.
import { useState } from 'react';
import type { Piece } from '../../../../shared/schemas/option';
import type { PieceModel } from '../../../../shared/schemas/piece-model';
import { resizePiece, updatePiece, type Command } from '../../../../shared/commands';
import { formatLength, type LengthUnit } from '../../../../shared/units/length';
import { Button } from '../../../components/ui/button';
import { readerLocale } from '../../../lib/length-unit';
import { sizeDiffers } from './piece-model-size';

/** "2,100 mm × 900 mm × 850 mm": a label's size, its thousands grouped as the reader writes them. */
const sizeWords = (w: number, d: number, h: number, unit: LengthUnit) => {
  const locale = readerLocale();
  return [w, d, h].map((mm) => formatLength(mm, unit, { locale })).join(' × ');
};

export function PieceModelField({
  piece,
  models,
  optionId,
  run,
  unit,
  readOnly,
}: {
  piece: Piece;
  models: PieceModel[];
  optionId: string;
  run: (c: Command) => boolean;
  unit: LengthUnit;
  readOnly: boolean;
}) {
  const [choosing, setChoosing] = useState(false);
  const ready = models.filter((m) => m.status === 'ready' && m.size);
  const worn = piece.modelId ? models.find((m) => m.id === piece.modelId) : undefined;

  const wear = (model: PieceModel | null) => {
    setChoosing(false);
    if (!model) return run(updatePiece(optionId, piece.id, { modelId: null, modelFitted: false }));
    // The schedule uses the piece's own price and link: the model's are defaults for a piece without them.
    return run(
      updatePiece(optionId, piece.id, {
        modelId: model.id,
        modelFitted: false,
        ...(piece.price == null && model.price !== null ? { price: model.price } : {}),
        ...(!piece.supplierUrl && model.link ? { supplierUrl: model.link } : {}),
      }),
    );
  };
  const size = worn?.size;
  const differs = size && sizeDiffers(piece, size) && !piece.modelFitted;

  return (
    <section className="flex flex-col gap-2" aria-label="Model">
      <h3 className="text-sm font-semibold">Model</h3>
      {piece.modelId && !worn && (
        <p className="text-sm text-ink-soft">Its model is no longer in the library: the form is drawn.</p>
      )}
      {worn && (
        <div className="flex items-center gap-3 rounded-lg border border-line bg-white p-2">
          <ModelStill model={worn} />
          <div className="min-w-0 flex-1">
            <div className="truncate text-sm font-semibold">{worn.name}</div>
            {size && (
              <div className="text-xs text-ink-faint tabular-nums">
                {sizeWords(size.widthMm, size.depthMm, size.heightMm, unit)}
              </div>
            )}
          </div>
        </div>
      )}
      {differs && (
        <div className="flex flex-col gap-2 rounded-lg bg-ochre-wash px-3 py-2 text-sm text-ochre" role="status">
          <p>
            The model measures {sizeWords(size.widthMm, size.depthMm, size.heightMm, unit)}; the piece's box is{' '}
            {sizeWords(piece.width, piece.depth, piece.height, unit)}.
          </p>
          {!readOnly && (
            <div className="flex flex-wrap gap-2">
              <Button
                size="sm"
                onClick={() =>
                  run(resizePiece(optionId, piece.id, { width: size.widthMm, depth: size.depthMm, height: size.heightMm }))
                }
              >
                Use the model's size
              </Button>
              <Button size="sm" variant="quiet" onClick={() => run(updatePiece(optionId, piece.id, { modelFitted: true }))}>
                Fit into the box
              </Button>
            </div>
          )}
        </div>
      )}
      {worn && (
        <label className="flex items-center gap-2 text-sm">
          <input
            type="checkbox"
            checked={piece.modelWearsFinishes ?? false}
            disabled={readOnly}
            onChange={(e) => run(updatePiece(optionId, piece.id, { modelWearsFinishes: e.target.checked }))}
          />
          Wear this piece's finishes
        </label>
      )}
      {!readOnly && !choosing && (
        <div className="flex gap-2">
          <Button size="sm" onClick={() => setChoosing(true)}>
            {worn ? 'Change model' : 'Choose a model'}
          </Button>
          {piece.modelId && (
            <Button size="sm" variant="quiet" onClick={() => wear(null)}>
              No model
            </Button>
          )}
        </div>
      )}
      {choosing && (
        <div className="flex flex-col gap-1">
          {ready.length === 0 ? (
            <p className="text-sm text-ink-soft">No ready models yet: upload them in Models.</p>
          ) : (
            <ul className="flex max-h-64 flex-col gap-1 overflow-y-auto" aria-label="Models to wear">
              {ready.map((m) => (
                <li key={m.id}>
                  <button
                    type="button"
                    className={`flex w-full items-center gap-3 rounded-lg border px-2 py-1.5 text-left hover:border-pine ${m.id === piece.modelId ? 'border-pine bg-pine-wash' : 'border-line bg-white'}`}
                    onClick={() => wear(m)}
                  >
                    <ModelStill model={m} />
                    <span className="min-w-0 flex-1 truncate text-sm font-semibold">{m.name}</span>
                  </button>
                </li>
              ))}
            </ul>
          )}
          <Button size="sm" variant="quiet" onClick={() => setChoosing(false)}>
            Cancel
          </Button>
        </div>
      )}
    </section>
  );
}

function ModelStill({ model }: { model: PieceModel }) {
  return model.thumbnailUrl ? (
    <img src={model.thumbnailUrl} alt="" className="size-10 shrink-0 rounded-md bg-sand object-contain" />
  ) : (
    <span className="flex size-10 shrink-0 items-center justify-center rounded-md bg-sand text-xs text-ink-faint" aria-hidden>
      3D
    </span>
  );
}
