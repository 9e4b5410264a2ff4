// Uploading photos of samples to the finish library: drop or pick files, a few sent at once, each
// with its own row of progress and status.
import { useRef, useState, useSyncExternalStore, type DragEvent } from 'react';
import { Link } from 'react-router';
import { useQueryClient, type QueryClient } from '@tanstack/react-query';
import { UPLOAD_LIMITS } from '../../../../shared/schemas/finish';
import { Button } from '../../../components/ui/button';
import { errorMessage } from '../../../lib/api';
import { useSession } from '../../../lib/session';
import { finishKeys, uploadPhoto, useFinish } from '../api/finishes';

interface UploadItem {
  key: string;
  file: File;
  progress: number;
  finishId?: string;
  error?: string;
}

/** Photos sent at once: enough to keep the line busy, few enough that each bar moves. */
const PARALLEL_UPLOADS = 2;
const MB = 1024 * 1024;

// The uploads live outside the page, so opening a finish mid-upload and coming back keeps the
// list and the uploads still running.
let items: UploadItem[] = [];
/** Whose uploads the list shows: another member signing in on this tab starts with an empty list. */
let listOwner: string | undefined;
let nextKey = 0;
const listeners = new Set<() => void>();
const waiting: UploadItem[] = [];
let active = 0;
const uploads = {
  subscribe(listener: () => void) {
    listeners.add(listener);
    return () => listeners.delete(listener);
  },
  snapshot: () => items,
  update(change: (all: UploadItem[]) => UploadItem[]) {
    items = change(items);
    for (const l of listeners) l();
  },
};
const patch = (key: string, change: Partial<UploadItem>) =>
  uploads.update((all) => all.map((i) => (i.key === key ? { ...i, ...change } : i)));

function pump(qc: QueryClient) {
  while (active < PARALLEL_UPLOADS && waiting.length > 0) {
    const item = waiting.shift()!;
    active += 1;
    uploadPhoto(item.file, (progress) => patch(item.key, { progress }))
      .then((finish) => {
        patch(item.key, { progress: 1, finishId: finish.id });
        qc.invalidateQueries({ queryKey: finishKeys.lists() });
      })
      .catch((err) => patch(item.key, { error: errorMessage(err) }))
      .finally(() => {
        active -= 1;
        pump(qc);
      });
  }
}

function addUploads(files: File[], qc: QueryClient) {
  const fresh = files.map((file): UploadItem => {
    nextKey += 1;
    // Said here so a large file is not sent only to be refused; the server checks again.
    const tooBig = file.size > UPLOAD_LIMITS.maxFileBytes;
    return {
      key: `u${nextKey}`,
      file,
      progress: 0,
      error: tooBig ? `Larger than ${UPLOAD_LIMITS.maxFileBytes / MB} MB. Export it smaller and try again.` : undefined,
    };
  });
  uploads.update((all) => [...fresh, ...all]);
  waiting.push(...fresh.filter((i) => !i.error));
  pump(qc);
}

const formatBytes = (bytes: number) =>
  bytes < MB ? `${Math.max(1, Math.round(bytes / 1024))} KB` : `${(bytes / MB).toFixed(1)} MB`;

/** Drop or pick photos of samples; each gets its own row with progress and status. */
export function PhotoUpload() {
  const memberId = useSession().data?.member.id;
  if (memberId !== listOwner) {
    listOwner = memberId;
    items = [];
  }
  const list = useSyncExternalStore(uploads.subscribe, uploads.snapshot);
  const [over, setOver] = useState(false);
  const input = useRef<HTMLInputElement>(null);
  const qc = useQueryClient();
  const add = (files: File[]) => addUploads(files, qc);

  const onDrop = (e: DragEvent) => {
    e.preventDefault();
    setOver(false);
    add([...e.dataTransfer.files]);
  };

  return (
    <section aria-label="Upload photos" className="mb-8">
      <div
        onDragOver={(e) => {
          e.preventDefault();
          setOver(true);
        }}
        onDragLeave={() => setOver(false)}
        onDrop={onDrop}
        className={`flex flex-col items-center gap-3 rounded-2xl border-2 border-dashed px-6 py-8 text-center transition-colors ${over ? 'border-pine bg-pine-wash' : 'border-line-strong bg-white'}`}
      >
        <p className="font-semibold text-ink">Drop photos of your samples here</p>
        <p className="max-w-lg text-sm text-ink-soft">
          Floor boards, tiles, fabrics, wallpapers: photographed flat and square-on. JPEG, PNG or WebP, up to{' '}
          {UPLOAD_LIMITS.maxFileBytes / MB} MB and {UPLOAD_LIMITS.maxPixels / 1_000_000} megapixels each.
        </p>
        <Button variant="primary" onClick={() => input.current?.click()}>
          Choose photos
        </Button>
        <input
          ref={input}
          type="file"
          multiple
          accept={UPLOAD_LIMITS.types.join(',')}
          className="sr-only"
          aria-label="Choose photos"
          tabIndex={-1}
          onChange={(e) => {
            add([...(e.target.files ?? [])]);
            e.target.value = '';
          }}
        />
      </div>
      {list.length > 0 && (
        <div className="mt-4 rounded-2xl border border-line bg-white">
          <div className="flex items-center justify-between border-b border-line px-5 py-3">
            <h2 className="text-sm font-semibold text-ink-soft">Uploads</h2>
            <Button size="sm" variant="quiet" onClick={() => uploads.update((all) => all.filter((i) => !i.finishId && !i.error))}>
              Clear list
            </Button>
          </div>
          <ul>
            {list.map((item) => (
              <UploadRow key={item.key} item={item} />
            ))}
          </ul>
        </div>
      )}
    </section>
  );
}

function UploadRow({ item }: { item: UploadItem }) {
  const finish = useFinish(item.finishId ?? '');
  const photo = item.finishId && finish.data?.finish.kind === 'photo' ? finish.data.finish : null;
  const state = item.error ? 'failed' : !item.finishId ? 'uploading' : (photo?.status ?? 'processing');
  const reason = item.error ?? (photo?.status === 'failed' ? photo.failureReason : null);
  const percent = Math.round((state === 'uploading' ? item.progress : 1) * 100);
  const label = { uploading: `Uploading ${percent}%`, processing: 'Processing…', ready: 'Ready', failed: 'Failed' }[state];
  const barColour = state === 'failed' ? 'bg-clay' : state === 'ready' ? 'bg-pine' : 'bg-pine/70';
  return (
    <li
      className="grid grid-cols-[minmax(0,1fr)_9.5rem] items-center gap-x-4 gap-y-1.5 border-b border-line px-5 py-3 last:border-0"
      aria-label={`Upload of ${item.file.name}`}
    >
      <div className="min-w-0 truncate text-[15px] font-semibold" title={item.file.name}>
        {item.file.name} <span className="font-normal text-ink-faint">· {formatBytes(item.file.size)}</span>
      </div>
      <div
        className={`text-right text-sm font-semibold ${state === 'failed' ? 'text-clay' : state === 'ready' ? 'text-pine-dark' : 'text-ink-soft'}`}
        role="status"
      >
        {label}
      </div>
      <div
        className="h-1.5 overflow-hidden rounded-full bg-sand"
        role="progressbar"
        aria-label={`${item.file.name} progress`}
        aria-valuemin={0}
        aria-valuemax={100}
        aria-valuenow={percent}
      >
        <div
          className={`h-full rounded-full transition-[width] ${barColour} ${state === 'processing' ? 'animate-pulse' : ''}`}
          style={{ width: `${percent}%` }}
        />
      </div>
      <div className="text-right text-sm">
        {state === 'ready' && photo && (
          <Link to={`/finishes/${photo.id}`} className="font-semibold text-pine hover:underline">
            Set size and crop
          </Link>
        )}
      </div>
      {reason && <p className="col-span-2 text-sm text-clay">{reason}</p>}
    </li>
  );
}
