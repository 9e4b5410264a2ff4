// One finish's page in the finish library: its fields (each saving on its own), and for a photo
// finish its crop, real repeat size and the 3 × 3 repeat preview.
import { useCallback, useEffect, useState, type ReactNode } from 'react';
import { Link, useNavigate } from 'react-router';
import {
  EDGE_BLENDS,
  FINISH_CATEGORIES,
  MIN_CROP_FRACTION,
  PRICE_UNITS,
  type Crop,
  type EdgeBlend,
  type FinishCategory,
  type FinishPatch,
  type PaintFinish,
  type PhotoFinish,
  type PriceUnit,
} from '../../../../shared/schemas/finish';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { CommitTextField } from '../../../components/ui/commit-field';
import { SelectField } from '../../../components/ui/field';
import { LengthField } from '../../../components/ui/length-field';
import { Card, Notice, PageHeader, Spinner } from '../../../components/ui/layout';
import { numberParser, textParser, type CommitAnswer, asIs } from '../../../components/ui/use-commit-text';
import { commitAnswer, errorMessage, fieldError } from '../../../lib/api';
import { useCanEdit } from '../../../lib/session';
import { useDeleteFinish, useFinish, useUpdateFinish, type Finish } from '../api/finishes';
import { CropBox } from './crop-box';
import { CATEGORY_LABELS, EDGE_BLEND_LABELS, finishSummary, formatRepeat, PRICE_UNIT_CHOICES } from './finish-labels';
import { PaintFields } from './paint-fields';
import { Swatch } from './swatch';

/** The crop and the real size may differ in proportion by this much before we say the texture will stretch. */
const STRETCH_TOLERANCE = 0.03;

/** One finish: its details, and for a photo finish its crop and the 3 × 3 repeat preview. */
export function FinishDetailPage({ id }: { id: string }) {
  const finish = useFinish(id);
  const canEdit = useCanEdit();
  const [deleting, setDeleting] = useState(false);

  if (finish.isPending) return <Spinner label="Loading finish…" />;
  if (finish.isError) {
    return (
      <div className="flex flex-col gap-4">
        <Notice tone="error">{errorMessage(finish.error)}</Notice>
        <Link to="/finishes" className="font-semibold text-pine">
          Back to the finish library
        </Link>
      </div>
    );
  }
  const f = finish.data.finish;
  return (
    <div>
      <PageHeader
        eyebrow={
          <Link to="/finishes" className="hover:text-ink hover:underline">
            Finish library
          </Link>
        }
        title={
          <span className="flex flex-wrap items-center gap-3">
            {f.name}
            {f.kind === 'photo' && f.status !== 'ready' && <StatusChip failed={f.status === 'failed'} />}
          </span>
        }
        actions={
          canEdit && (
            <Button variant="danger" onClick={() => setDeleting(true)}>
              Delete
            </Button>
          )
        }
      >
        {finishSummary(f)}
      </PageHeader>
      {f.kind === 'photo' ? (
        <PhotoFinishDetail key={f.id} finish={f} canEdit={canEdit} />
      ) : (
        <PaintDetail key={f.id} finish={f} canEdit={canEdit} />
      )}
      {deleting && <DeleteDialog finish={f} onClose={() => setDeleting(false)} />}
    </div>
  );
}

function StatusChip({ failed }: { failed: boolean }) {
  return (
    <span
      className={`inline-flex items-center rounded-full px-2.5 py-0.5 text-xs font-semibold ${failed ? 'bg-clay-wash text-clay' : 'bg-ochre-wash text-ochre'}`}
    >
      {failed ? 'Failed' : 'Processing'}
    </span>
  );
}

function PhotoFinishDetail({ finish, canEdit }: { finish: PhotoFinish; canEdit: boolean }) {
  const update = useUpdateFinish(finish.id);
  const [crop, setCrop] = useState<Crop>(finish.crop);
  const [edgeBlend, setEdgeBlend] = useState<EdgeBlend>(finish.edgeBlend);
  // A crop applied elsewhere (or just now) becomes the one on screen.
  const savedCrop = JSON.stringify(finish.crop);
  useEffect(() => setCrop(JSON.parse(savedCrop) as Crop), [savedCrop]);
  useEffect(() => setEdgeBlend(finish.edgeBlend), [finish.edgeBlend]);

  const changed = JSON.stringify(crop) !== savedCrop || edgeBlend !== finish.edgeBlend;
  const cropAspect = (crop.width * finish.photoWidthPx) / (crop.height * finish.photoHeightPx);
  const realAspect = finish.repeatWidthMm / finish.repeatHeightMm;
  const stretched = Math.abs(cropAspect / realAspect - 1) > STRETCH_TOLERANCE;

  return (
    <div className="flex flex-col gap-6">
      {finish.status === 'failed' && <Notice tone="error">{finish.failureReason ?? 'This photo could not be processed.'}</Notice>}
      <div className="grid items-start gap-6 lg:grid-cols-2">
        <Card title="Crop" className="min-w-0">
          {finish.files.photoUrl ? (
            <div className="flex flex-col gap-4">
              <p className="text-sm text-ink-soft">
                Frame the part of the photo that covers the real size. Drag the box, or a corner to resize it; or type the edges
                below.
              </p>
              <CropBox
                src={finish.files.photoUrl}
                widthPx={finish.photoWidthPx}
                heightPx={finish.photoHeightPx}
                crop={crop}
                onChange={setCrop}
                disabled={!canEdit}
              />
              <CropFields crop={crop} onChange={setCrop} disabled={!canEdit} error={fieldError(update.error, 'crop')} />
              {stretched && (
                <Notice tone="warn">
                  The crop is {cropAspect.toFixed(2)} : 1 but the real size is {realAspect.toFixed(2)} : 1, so the texture will be
                  stretched to fit.
                  {canEdit && (
                    <>
                      {' '}
                      <button
                        type="button"
                        className="font-semibold underline"
                        onClick={() => setCrop(matchProportions(crop, finish))}
                      >
                        Match the real size
                      </button>
                    </>
                  )}
                </Notice>
              )}
              {canEdit && (
                <div className="flex flex-wrap items-end justify-between gap-3">
                  <SelectField
                    label="Edge blend"
                    value={edgeBlend}
                    onChange={(e) => setEdgeBlend(e.target.value as EdgeBlend)}
                    className="min-w-0 flex-1"
                    hint="Blends each edge with its mirror image so copies meet without a seam."
                  >
                    {EDGE_BLENDS.map((b) => (
                      <option key={b} value={b}>
                        {EDGE_BLEND_LABELS[b]}
                      </option>
                    ))}
                  </SelectField>
                  <div className="flex gap-2">
                    <Button
                      variant="quiet"
                      disabled={!changed}
                      onClick={() => {
                        setCrop(finish.crop);
                        setEdgeBlend(finish.edgeBlend);
                      }}
                    >
                      Reset
                    </Button>
                    <Button
                      variant="primary"
                      disabled={!changed}
                      busy={update.isPending}
                      onClick={() => update.mutate({ crop, edgeBlend })}
                    >
                      Apply crop
                    </Button>
                  </div>
                </div>
              )}
            </div>
          ) : (
            <Swatch finish={finish} className="max-w-64" />
          )}
        </Card>
        <Card title="Repeat preview" className="min-w-0">
          <RepeatPreview finish={finish} />
        </Card>
      </div>
      <Card title="Details">
        <PhotoDetailsForm finish={finish} canEdit={canEdit} />
      </Card>
    </div>
  );
}

/** The 3 × 3 preview drawn at the real size's proportions (the texture is stretched to them in 3D too). */
function RepeatPreview({ finish }: { finish: PhotoFinish }) {
  if (finish.status === 'processing') return <Spinner label="Processing the photo…" />;
  if (!finish.files.previewUrl) return <p className="text-sm text-ink-soft">No preview: the photo could not be processed.</p>;
  const aspect = finish.repeatWidthMm / finish.repeatHeightMm;
  return (
    <figure className="flex flex-col gap-3">
      <img
        src={finish.files.previewUrl}
        alt={`${finish.name} repeated three by three`}
        className="mx-auto rounded-xl border border-line"
        style={{ aspectRatio: `${finish.repeatWidthMm} / ${finish.repeatHeightMm}`, width: `min(100%, ${24 * aspect}rem)` }}
      />
      <figcaption className="text-center text-sm text-ink-soft">
        Nine copies side by side: {formatRepeat(finish.repeatWidthMm * 3, finish.repeatHeightMm * 3)} of surface. Look for seams
        and repeating marks.
      </figcaption>
    </figure>
  );
}

/** Keeps the crop's width and changes its height (or the other way round) to the real size's proportions. */
function matchProportions(crop: Crop, finish: PhotoFinish): Crop {
  const realAspect = finish.repeatWidthMm / finish.repeatHeightMm;
  let width = crop.width;
  let height = (width * finish.photoWidthPx) / (realAspect * finish.photoHeightPx);
  if (height > 1) {
    height = 1;
    width = (height * realAspect * finish.photoHeightPx) / finish.photoWidthPx;
  }
  const x = Math.min(crop.x, 1 - width);
  const y = Math.min(crop.y, 1 - height);
  return { x: Math.max(0, x), y: Math.max(0, y), width, height };
}

const PERCENT_FIELDS = [
  { key: 'x', label: 'Left' },
  { key: 'y', label: 'Top' },
  { key: 'width', label: 'Width' },
  { key: 'height', label: 'Height' },
] as const;

/** The crop typed as percentages of the photo. */
function CropFields({
  crop,
  onChange,
  disabled,
  error,
}: {
  crop: Crop;
  onChange: (c: Crop) => void;
  disabled: boolean;
  error?: string;
}) {
  return (
    <fieldset className="grid grid-cols-2 gap-3 sm:grid-cols-4" disabled={disabled}>
      <legend className="sr-only">Crop, in percent of the photo</legend>
      {PERCENT_FIELDS.map(({ key, label }) => (
        <PercentField
          key={key}
          label={`${label} %`}
          value={crop[key]}
          min={key === 'width' || key === 'height' ? MIN_CROP_FRACTION : 0}
          max={key === 'x' ? 1 - crop.width : key === 'y' ? 1 - crop.height : key === 'width' ? 1 - crop.x : 1 - crop.y}
          onChange={(v) => onChange({ ...crop, [key]: v })}
        />
      ))}
      {error && (
        <p className="col-span-full text-sm text-clay" role="alert">
          {error}
        </p>
      )}
    </fieldset>
  );
}

function PercentField({
  label,
  value,
  min,
  max,
  onChange,
}: {
  label: string;
  value: number;
  min: number;
  max: number;
  onChange: (v: number) => void;
}) {
  return (
    <CommitTextField<number>
      label={label}
      value={value}
      format={(v) => (v * 100).toFixed(1)}
      parse={(text) => {
        const n = Number(text.trim().replace(',', '.'));
        if (text.trim() === '' || !Number.isFinite(n)) return { ok: false, message: 'Enter a percentage.' };
        return { ok: true, value: Math.min(max, Math.max(min, n / 100)) };
      }}
      equal={(a, b) => Math.abs(a - b) < 0.0005}
      onCommit={onChange}
      inputMode="decimal"
    />
  );
}

/**
 * Each field of a finish saves on its own, the way the room editor's do: on Enter, on leaving the
 * field and before it goes away; Escape puts back the saved value. A refusal stays beside the field.
 */
function useSaveField(finishId: string) {
  const update = useUpdateFinish(finishId);
  const save = useCallback(
    (patch: FinishPatch, field: string): Promise<CommitAnswer> => commitAnswer(update.mutateAsync(patch), field),
    [update.mutateAsync], // eslint-disable-line react-hooks/exhaustive-deps
  );
  return { save, saving: update.isPending, saved: update.isSuccess };
}

type SaveField = ReturnType<typeof useSaveField>['save'];

function CommonFields({
  finish,
  save,
  disabled,
}: {
  finish: Finish;
  save: SaveField;
  disabled: boolean;
}): Record<'name' | 'supplier' | 'code' | 'price', ReactNode> {
  const units = PRICE_UNITS[finish.kind];
  const unit = finish.priceUnit && (units as readonly PriceUnit[]).includes(finish.priceUnit) ? finish.priceUnit : units[0];
  return {
    name: (
      <CommitTextField
        label="Name"
        value={finish.name}
        format={asIs}
        parse={textParser('Enter a name.')}
        onCommit={(name) => save({ name }, 'name')}
        disabled={disabled}
      />
    ),
    supplier: (
      <CommitTextField
        label="Supplier"
        value={finish.supplier ?? ''}
        format={asIs}
        parse={textParser(null)}
        onCommit={(supplier) => save({ supplier }, 'supplier')}
        disabled={disabled}
      />
    ),
    code: (
      <CommitTextField
        label="Code"
        value={finish.code ?? ''}
        format={asIs}
        parse={textParser(null)}
        onCommit={(code) => save({ code }, 'code')}
        disabled={disabled}
      />
    ),
    price: (
      <div className="grid grid-cols-[minmax(0,1fr)_auto] gap-3">
        <CommitTextField<number | null>
          label="Price"
          value={finish.price}
          format={(v) => (v === null ? '' : String(v))}
          parse={numberParser({ min: 0, optional: true, what: 'a price' })}
          onCommit={(price) => save({ price, priceUnit: price === null ? null : unit }, 'price')}
          inputMode="decimal"
          disabled={disabled}
        />
        <SelectField
          label="Per"
          value={unit}
          onChange={(e) => void save({ price: finish.price, priceUnit: e.target.value as PriceUnit }, 'priceUnit')}
          disabled={disabled || finish.price === null}
        >
          {units.map((u) => (
            <option key={u} value={u}>
              {PRICE_UNIT_CHOICES[u]}
            </option>
          ))}
        </SelectField>
      </div>
    ),
  };
}

function SavedNote({ saving, saved }: { saving: boolean; saved: boolean }) {
  return (
    <p className="text-sm text-ink-faint" role="status" data-testid="finish-save-state">
      {saving ? 'Saving…' : saved ? 'All changes saved' : 'Each field saves when you press Enter or move on.'}
    </p>
  );
}

function PhotoDetailsForm({ finish, canEdit }: { finish: PhotoFinish; canEdit: boolean }) {
  const { save, saving, saved } = useSaveField(finish.id);
  const fields = CommonFields({ finish, save, disabled: !canEdit });
  return (
    <div className="grid gap-x-5 gap-y-4 sm:grid-cols-2 lg:grid-cols-4">
      <div className="sm:col-span-2">{fields.name}</div>
      <SelectField
        label="Category"
        value={finish.category}
        onChange={(e) => void save({ category: e.target.value as FinishCategory }, 'category')}
        disabled={!canEdit}
      >
        {FINISH_CATEGORIES.map((c) => (
          <option key={c} value={c}>
            {CATEGORY_LABELS[c]}
          </option>
        ))}
      </SelectField>
      {fields.supplier}
      <fieldset className="flex flex-col gap-2 sm:col-span-2" disabled={!canEdit}>
        <legend className="sr-only">Real size of the crop</legend>
        <div className="grid grid-cols-2 gap-3">
          <LengthField
            label="Real width"
            commit="blur"
            valueMm={finish.repeatWidthMm}
            onChange={(mm) => (mm === null ? 'Enter a size.' : save({ repeatWidthMm: mm }, 'repeatWidthMm'))}
          />
          <LengthField
            label="Real height"
            commit="blur"
            valueMm={finish.repeatHeightMm}
            onChange={(mm) => (mm === null ? 'Enter a size.' : save({ repeatHeightMm: mm }, 'repeatHeightMm'))}
          />
        </div>
        <p className="text-sm text-ink-faint">The real size the crop covers: one 60 × 60 cm tile, four 18 cm boards across…</p>
      </fieldset>
      {fields.code}
      {fields.price}
      <div className="sm:col-span-2 lg:col-span-4">{canEdit && <SavedNote saving={saving} saved={saved} />}</div>
    </div>
  );
}

function PaintDetail({ finish, canEdit }: { finish: PaintFinish; canEdit: boolean }) {
  const { save, saving, saved } = useSaveField(finish.id);
  const fields = CommonFields({ finish, save, disabled: !canEdit });
  const [shownHex, setShownHex] = useState(finish.colourHex);
  useEffect(() => setShownHex(finish.colourHex), [finish.colourHex]);
  return (
    <div className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_22rem]">
      <Card title="Colour" className="self-start">
        <div
          className="aspect-[16/9] w-full rounded-xl border border-line"
          style={{ backgroundColor: shownHex }}
          role="img"
          aria-label={`Colour ${shownHex}`}
        />
      </Card>
      <Card title="Details" className="self-start">
        <div className="flex flex-col gap-4">
          {fields.name}
          <PaintFields
            colourHex={finish.colourHex}
            sheen={finish.sheen}
            onColour={setShownHex}
            commitColour={(colourHex) => save({ colourHex }, 'colourHex')}
            onSheen={(sheen) => void save({ sheen }, 'sheen')}
            disabled={!canEdit}
          />
          {fields.supplier}
          {fields.code}
          {fields.price}
          {canEdit && <SavedNote saving={saving} saved={saved} />}
        </div>
      </Card>
    </div>
  );
}

function DeleteDialog({ finish, onClose }: { finish: Finish; onClose: () => void }) {
  const remove = useDeleteFinish();
  const navigate = useNavigate();
  return (
    <Dialog
      open
      onClose={onClose}
      title="Delete this finish?"
      footer={
        <>
          <Button variant="quiet" onClick={onClose}>
            Cancel
          </Button>
          <Button
            variant="danger"
            busy={remove.isPending}
            onClick={() => remove.mutate(finish.id, { onSuccess: () => navigate('/finishes', { replace: true }) })}
          >
            Delete {finish.name}
          </Button>
        </>
      }
    >
      <p className="text-ink-soft">Surfaces of options that use it will have no finish until you choose another.</p>
      {remove.isError && (
        <div className="mt-4">
          <Notice tone="error">{errorMessage(remove.error)}</Notice>
        </div>
      )}
    </Dialog>
  );
}
