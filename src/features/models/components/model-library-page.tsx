// The piece model library page: the studio's 3D models as cards (thumbnail, name, measured size,
// status), the storage they use of the quota, and the upload for owners and designers.
import { Link } from 'react-router';
import { EmptyState, Notice, PageHeader, Spinner } from '../../../components/ui/layout';
import { errorMessage } from '../../../lib/api';
import { useCanEdit } from '../../../lib/session';
import { readerLocale, readUnit } from '../../../lib/length-unit';
import { usePieceModels, type PieceModel } from '../api/models';
import { formatModelSize, formatStorage } from './model-labels';
import { ModelUpload } from './model-upload';
import { useModelThumbnails } from './use-model-thumbnails';

/** The studio's piece models: upload them, see them measured, open one to set its details. */
export function ModelLibraryPage() {
  const canEdit = useCanEdit();
  const models = usePieceModels();
  useModelThumbnails(models.data?.models, canEdit);
  return (
    <div>
      <PageHeader
        title="Models"
        actions={
          models.data && (
            <span className="text-sm text-ink-soft tabular-nums" data-testid="model-storage">
              {formatStorage(models.data.usedBytes)} of {formatStorage(models.data.quotaBytes)}
            </span>
          )
        }
      >
        The real pieces you propose, in 3D, at their true size: the client walks round them.
      </PageHeader>
      {canEdit && <ModelUpload />}
      {models.isPending ? (
        <Spinner label="Loading models…" />
      ) : models.isError ? (
        <Notice tone="error">{errorMessage(models.error)}</Notice>
      ) : models.data.models.length === 0 ? (
        <EmptyState title="No models yet.">{canEdit && 'Upload a .glb or .gltf file of a piece above.'}</EmptyState>
      ) : (
        <ul className="grid grid-cols-2 gap-5 sm:grid-cols-3 lg:grid-cols-4" aria-label="Models">
          {models.data.models.map((m) => (
            <li key={m.id}>
              <ModelCard model={m} />
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}

/** The model's still, or a calm placeholder while there is none. */
export function ModelThumbnail({ model, className = '' }: { model: PieceModel; className?: string }) {
  return model.thumbnailUrl ? (
    <img src={model.thumbnailUrl} alt="" className={`aspect-square w-full rounded-xl bg-sand object-contain ${className}`} />
  ) : (
    <div
      className={`flex aspect-square w-full items-center justify-center rounded-xl bg-sand text-sm text-ink-faint ${className}`}
      aria-hidden
    >
      {model.status === 'processing' ? 'Measuring…' : '3D'}
    </div>
  );
}

function ModelCard({ model }: { model: PieceModel }) {
  return (
    <Link
      to={`/models/${model.id}`}
      className="group flex h-full flex-col gap-3 rounded-2xl border border-line bg-white p-3 transition-colors hover:border-line-strong"
      aria-label={model.name}
    >
      <ModelThumbnail model={model} />
      <div className="min-w-0 px-1 pb-1">
        <div className="truncate font-semibold text-ink group-hover:underline" title={model.name}>
          {model.name}
        </div>
        {model.status === 'ready' && model.size && (
          <div className="text-sm text-ink-soft tabular-nums">{formatModelSize(model.size, readUnit(), readerLocale())}</div>
        )}
        {model.status === 'processing' && <div className="text-sm text-ochre">Processing</div>}
        {model.status === 'failed' && (
          <div className="text-sm text-clay">Failed{model.failureReason ? `: ${model.failureReason}` : ''}</div>
        )}
        {model.unitHint && <div className="text-sm text-ochre">Looks authored in {model.unitHint}: check its size</div>}
      </div>
    </Link>
  );
}
