// One piece model's page: its turning preview and measured size, its details (each saving on its
// own), the quarter turn, the unit fix when its size looks authored in cm or mm, and Delete.
import { useState } from 'react';
import { Link, useNavigate } from 'react-router';
import { PIECE_KINDS, KIND_LABELS, type PieceKind } from '../../../../shared/schemas/piece-kind';
import { isWebLink } from '../../../../shared/schemas/option';
import type { ModelTurn, PieceModel, PieceModelPatch } from '../../../../shared/schemas/piece-model';
import { Button } from '../../../components/ui/button';
import { CommitTextField } from '../../../components/ui/commit-field';
import { Dialog } from '../../../components/ui/dialog';
import { SelectField } from '../../../components/ui/field';
import { Card, Notice, PageHeader, Spinner } from '../../../components/ui/layout';
import { asIs, numberParser, textParser, type Parsed } from '../../../components/ui/use-commit-text';
import { ApiError, commitAnswer, errorMessage } from '../../../lib/api';
import { useCanEdit } from '../../../lib/session';
import { readerLocale, readUnit } from '../../../lib/length-unit';
import { formatCount } from '../../../lib/format';
import { useDeletePieceModel, usePieceModel, useUpdatePieceModel, type ModelWearer } from '../api/models';
import { fixedSize, formatModelSize, UNIT_FIX } from './model-labels';
import { ModelThumbnail } from './model-library-page';
import { ModelPreview } from './model-preview';

const TURNS: readonly ModelTurn[] = [0, 90, 180, 270];

function parseLink(text: string): Parsed<string | null> {
  const t = text.trim();
  if (t === '') return { ok: true, value: null };
  return isWebLink(t) ? { ok: true, value: t } : { ok: false, message: 'Paste a full link, starting with https://' };
}

export function ModelDetailPage({ id }: { id: string }) {
  const answer = usePieceModel(id);
  const canEdit = useCanEdit();
  const [deleting, setDeleting] = useState(false);
  if (answer.isPending) return <Spinner label="Loading model…" />;
  if (answer.isError)
    return (
      <div className="flex flex-col gap-4">
        <Notice tone="error">{errorMessage(answer.error)}</Notice>
        <Link to="/models" className="font-semibold text-pine">
          Back to the models
        </Link>
      </div>
    );
  const model = answer.data.model;
  const unit = readUnit();
  return (
    <div>
      <PageHeader
        eyebrow={
          <Link to="/models" className="hover:text-ink hover:underline">
            Models
          </Link>
        }
        title={model.name}
        actions={
          canEdit && (
            <Button variant="danger" onClick={() => setDeleting(true)}>
              Delete
            </Button>
          )
        }
      >
        {model.size
          ? formatModelSize(model.size, unit, readerLocale())
          : model.status === 'processing'
            ? 'Being measured…'
            : model.fileName}
      </PageHeader>
      <div className="grid items-start gap-6 lg:grid-cols-[minmax(0,1fr)_24rem]">
        <Card title="Preview" className="min-w-0">
          {model.status === 'failed' && <Notice tone="error">{model.failureReason ?? 'This model could not be read.'}</Notice>}
          {model.status === 'ready' && model.modelUrl ? (
            <ModelPreview url={model.modelUrl} turnDeg={model.turnDeg} name={model.name} />
          ) : (
            <ModelThumbnail model={model} />
          )}
          {model.triangles !== null && (
            <p className="mt-3 text-sm text-ink-faint tabular-nums">
              {formatCount(model.triangles)} triangles · {model.materials} {model.materials === 1 ? 'material' : 'materials'}
            </p>
          )}
        </Card>
        <Card title="Details">
          <ModelFields key={model.id} model={model} canEdit={canEdit} />
        </Card>
      </div>
      {deleting && <DeleteModelDialog model={model} onClose={() => setDeleting(false)} />}
    </div>
  );
}

function ModelFields({ model, canEdit }: { model: PieceModel; canEdit: boolean }) {
  const update = useUpdatePieceModel(model.id);
  const save = (patch: PieceModelPatch, field: string) => commitAnswer(update.mutateAsync(patch), field);
  const fixed = fixedSize(model);
  const disabled = !canEdit;
  return (
    <div className="flex flex-col gap-4">
      {fixed && model.unitHint && (
        <Notice tone="warn">
          Read as metres this model is {formatModelSize(model.size!, 'm', readerLocale())}, too large for a piece.
          {canEdit && (
            <div className="mt-2">
              <Button
                size="sm"
                busy={update.isPending}
                onClick={() => void save({ scale: UNIT_FIX[model.unitHint!].scale }, 'scale')}
              >
                Read as {UNIT_FIX[model.unitHint].words}: {formatModelSize(fixed, 'mm', readerLocale())}
              </Button>
            </div>
          )}
        </Notice>
      )}
      <CommitTextField
        label="Name"
        value={model.name}
        format={asIs}
        parse={textParser('Give the model a name.')}
        onCommit={(name) => save({ name }, 'name')}
        disabled={disabled}
      />
      <SelectField
        label="Kind"
        value={model.kind ?? ''}
        onChange={(e) => void save({ kind: (e.target.value || null) as PieceKind | null }, 'kind')}
        disabled={disabled}
      >
        <option value="">No kind</option>
        {PIECE_KINDS.map((k) => (
          <option key={k} value={k}>
            {KIND_LABELS[k]}
          </option>
        ))}
      </SelectField>
      <fieldset className="flex flex-col gap-1.5" disabled={disabled}>
        <legend className="mb-1.5 text-sm font-semibold">Quarter turn</legend>
        <div className="grid grid-cols-4 gap-2">
          {TURNS.map((t) => (
            <label
              key={t}
              className={`flex cursor-pointer items-center justify-center rounded-lg border px-2 py-2 text-sm font-semibold ${model.turnDeg === t ? 'border-pine bg-pine-wash text-pine-dark' : 'border-line-strong bg-white'}`}
            >
              <input
                type="radio"
                className="sr-only"
                name="model-turn"
                checked={model.turnDeg === t}
                onChange={() => void save({ turnDeg: t }, 'turnDeg')}
              />
              {t}°
            </label>
          ))}
        </div>
        <span className="text-sm text-ink-faint">Turn it until its front faces you in the preview.</span>
      </fieldset>
      <CommitTextField
        label="Supplier"
        value={model.supplier ?? ''}
        format={asIs}
        parse={textParser(null)}
        onCommit={(supplier) => save({ supplier }, 'supplier')}
        disabled={disabled}
      />
      <CommitTextField
        label="Link"
        type="url"
        value={model.link}
        format={(v) => v ?? ''}
        parse={parseLink}
        onCommit={(link) => save({ link }, 'link')}
        disabled={disabled}
      />
      <CommitTextField<number | null>
        label="Price"
        value={model.price}
        format={(v) => (v === null ? '' : String(v))}
        parse={numberParser({ min: 0, optional: true, what: 'a price' })}
        onCommit={(price) => save({ price }, 'price')}
        inputMode="decimal"
        disabled={disabled}
        hint="Copied onto a piece when the piece wears this model."
      />
    </div>
  );
}

function DeleteModelDialog({ model, onClose }: { model: PieceModel; onClose: () => void }) {
  const remove = useDeletePieceModel();
  const navigate = useNavigate();
  const body = remove.error instanceof ApiError ? (remove.error.body as { wornBy?: ModelWearer[] } | null) : null;
  return (
    <Dialog
      open
      onClose={onClose}
      title="Delete this model?"
      footer={
        <>
          <Button variant="quiet" onClick={onClose}>
            Cancel
          </Button>
          <Button
            variant="danger"
            busy={remove.isPending}
            onClick={() => remove.mutate(model.id, { onSuccess: () => navigate('/models', { replace: true }) })}
          >
            Delete {model.name}
          </Button>
        </>
      }
    >
      {!body?.wornBy && <p className="text-ink-soft">Pieces that wear it go back to their drawn forms.</p>}
      {remove.isError && (
        <div className="mt-4 flex flex-col gap-2">
          <Notice tone="error">
            {body?.wornBy ? 'Pieces in these options wear this model. Take it off them first.' : errorMessage(remove.error)}
          </Notice>
          {body?.wornBy && (
            <ul className="list-disc pl-5 text-sm" aria-label="Options wearing this model">
              {body.wornBy.map((w) => (
                <li key={`${w.projectName}/${w.roomName}/${w.optionName}`}>
                  {w.projectName} · {w.roomName} · {w.optionName}
                </li>
              ))}
            </ul>
          )}
        </div>
      )}
    </Dialog>
  );
}
