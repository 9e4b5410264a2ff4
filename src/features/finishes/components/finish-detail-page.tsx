import { useEffect, useState, type FormEvent, type ReactNode } from 'react';
import { Link, useNavigate } from 'react-router';
import {
  EDGE_BLENDS,
  FINISH_CATEGORIES,
  MIN_CROP_FRACTION,
  type Crop,
  type EdgeBlend,
  type FinishCategory,
  type FinishPatch,
  type PaintFinish,
  type PhotoFinish,
  type PriceUnit,
  type Sheen,
} from '../../../../shared/schemas/finish';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { SelectField, TextField } from '../../../components/ui/field';
import { LengthField } from '../../../components/ui/length-field';
import { Card, Notice, PageHeader, Spinner } from '../../../components/ui/layout';
import { ApiError, errorMessage, fieldError } from '../../../lib/api';
import { useCanEdit } from '../../../lib/session';
import { useDeleteFinish, useFinish, useUpdateFinish, type Finish } from '../api/finishes';
import { CropBox } from './crop-box';
import { CATEGORY_LABELS, EDGE_BLEND_LABELS, finishSummary, formatRepeat } from './finish-labels';
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
  const shown = (value * 100).toFixed(1);
  const [text, setText] = useState(shown);
  useEffect(() => setText(shown), [shown]);
  const commit = () => {
    const n = Number(text.replace(',', '.'));
    if (Number.isFinite(n)) onChange(Math.min(max, Math.max(min, n / 100)));
    else setText(shown);
  };
  return (
    <TextField
      label={label}
      value={text}
      inputMode="decimal"
      onChange={(e) => setText(e.target.value)}
      onBlur={commit}
      onKeyDown={(e) => {
        if (e.key === 'Enter') {
          e.preventDefault();
          commit();
        }
      }}
    />
  );
}

/** Fields common to both kinds, and the text → number rules for a price. */
function useCommonFields(finish: Finish) {
  const [name, setName] = useState(finish.name);
  const [supplier, setSupplier] = useState(finish.supplier ?? '');
  const [code, setCode] = useState(finish.code ?? '');
  const [price, setPrice] = useState(finish.price === null ? '' : String(finish.price));
  const [priceUnit, setPriceUnit] = useState<PriceUnit>(finish.priceUnit ?? 'm2');
  const priceNumber = price.trim() === '' ? null : Number(price.replace(',', '.'));
  const body = {
    name,
    supplier,
    code,
    price: priceNumber,
    priceUnit: priceNumber === null ? null : priceUnit,
  } satisfies FinishPatch;
  const fields = (err: unknown, disabled: boolean): Record<'supplier' | 'code' | 'price', ReactNode> => ({
    supplier: (
      <TextField
        label="Supplier"
        value={supplier}
        onChange={(e) => setSupplier(e.target.value)}
        error={fieldError(err, 'supplier')}
        disabled={disabled}
      />
    ),
    code: (
      <TextField
        label="Code"
        value={code}
        onChange={(e) => setCode(e.target.value)}
        error={fieldError(err, 'code')}
        disabled={disabled}
      />
    ),
    price: (
      <div className="grid grid-cols-[minmax(0,1fr)_auto] gap-3">
        <TextField
          label="Price"
          value={price}
          inputMode="decimal"
          onChange={(e) => setPrice(e.target.value)}
          error={
            fieldError(err, 'price') ?? (priceNumber !== null && !Number.isFinite(priceNumber) ? 'Enter a number.' : undefined)
          }
          disabled={disabled}
        />
        <SelectField
          label="Per"
          value={priceUnit}
          onChange={(e) => setPriceUnit(e.target.value as PriceUnit)}
          disabled={disabled}
        >
          <option value="m2">m²</option>
          <option value="unit">unit</option>
        </SelectField>
      </div>
    ),
  });
  return { name, setName, body, fields, priceValid: priceNumber === null || Number.isFinite(priceNumber) };
}

function SaveRow({
  mutation,
  canEdit,
  saved,
}: {
  mutation: { isPending: boolean; error: unknown };
  canEdit: boolean;
  saved: boolean;
}) {
  const err = mutation.error;
  return (
    <>
      {err !== null && !(err instanceof ApiError && Object.keys(err.fields).length > 0) && (
        <Notice tone="error">{errorMessage(err)}</Notice>
      )}
      {canEdit && (
        <div className="flex items-center justify-end gap-3">
          {saved && (
            <span className="text-sm font-semibold text-pine-dark" role="status">
              Saved
            </span>
          )}
          <Button type="submit" variant="primary" busy={mutation.isPending}>
            Save
          </Button>
        </div>
      )}
    </>
  );
}

function PhotoDetailsForm({ finish, canEdit }: { finish: PhotoFinish; canEdit: boolean }) {
  const update = useUpdateFinish(finish.id);
  const common = useCommonFields(finish);
  const [category, setCategory] = useState<FinishCategory>(finish.category);
  const [widthMm, setWidthMm] = useState<number | null>(finish.repeatWidthMm);
  const [heightMm, setHeightMm] = useState<number | null>(finish.repeatHeightMm);
  const err = update.error;
  const fields = common.fields(err, !canEdit);
  const submit = (e: FormEvent) => {
    e.preventDefault();
    if (widthMm === null || heightMm === null || !common.priceValid) return;
    update.mutate({ ...common.body, category, repeatWidthMm: widthMm, repeatHeightMm: heightMm });
  };
  return (
    <form onSubmit={submit} className="grid gap-x-5 gap-y-4 sm:grid-cols-2 lg:grid-cols-4" noValidate>
      <TextField
        label="Name"
        value={common.name}
        onChange={(e) => common.setName(e.target.value)}
        error={fieldError(err, 'name')}
        disabled={!canEdit}
        className="sm:col-span-2"
      />
      <SelectField
        label="Category"
        value={category}
        onChange={(e) => setCategory(e.target.value as FinishCategory)}
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
            valueMm={widthMm}
            onChange={setWidthMm}
            error={fieldError(err, 'repeatWidthMm') ?? (widthMm === null ? 'Enter a size.' : undefined)}
          />
          <LengthField
            label="Real height"
            valueMm={heightMm}
            onChange={setHeightMm}
            error={fieldError(err, 'repeatHeightMm') ?? (heightMm === null ? 'Enter a size.' : undefined)}
          />
        </div>
        <p className="text-sm text-ink-faint">The real size the crop covers: one 60 × 60 cm tile, four 18 cm boards across…</p>
      </fieldset>
      {fields.code}
      {fields.price}
      <div className="flex flex-col gap-3 sm:col-span-2 lg:col-span-4">
        <SaveRow mutation={update} canEdit={canEdit} saved={update.isSuccess} />
      </div>
    </form>
  );
}

function PaintDetail({ finish, canEdit }: { finish: PaintFinish; canEdit: boolean }) {
  const update = useUpdateFinish(finish.id);
  const common = useCommonFields(finish);
  const [colourHex, setColourHex] = useState(finish.colourHex);
  const [sheen, setSheen] = useState<Sheen>(finish.sheen);
  const err = update.error;
  const fields = common.fields(err, !canEdit);
  const submit = (e: FormEvent) => {
    e.preventDefault();
    if (!common.priceValid) return;
    update.mutate({ ...common.body, colourHex, sheen });
  };
  return (
    <div className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_22rem]">
      <Card title="Colour" className="self-start">
        <div
          className="aspect-[16/9] w-full rounded-xl border border-line"
          style={{ backgroundColor: /^#[0-9a-fA-F]{6}$/.test(colourHex) ? colourHex : finish.colourHex }}
          role="img"
          aria-label={`Colour ${colourHex}`}
        />
      </Card>
      <Card title="Details" className="self-start">
        <form onSubmit={submit} className="flex flex-col gap-4" noValidate>
          <TextField
            label="Name"
            value={common.name}
            onChange={(e) => common.setName(e.target.value)}
            error={fieldError(err, 'name')}
            disabled={!canEdit}
          />
          <PaintFields
            colourHex={colourHex}
            sheen={sheen}
            onColour={setColourHex}
            onSheen={setSheen}
            colourError={fieldError(err, 'colourHex')}
            disabled={!canEdit}
          />
          {fields.supplier}
          {fields.code}
          {fields.price}
          <SaveRow mutation={update} canEdit={canEdit} saved={update.isSuccess} />
        </form>
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
