// Uploading piece models to the library: pick or drop .glb/.gltf files, each sent in its own request
// one after another, each with a row of progress and the server's answer.
import { useRef, useState } from 'react';
import { Link } from 'react-router';
import { useQueryClient } from '@tanstack/react-query';
import { MODEL_LIMITS } from '../../../../shared/schemas/piece-model';
import { Button } from '../../../components/ui/button';
import { errorMessage } from '../../../lib/api';
import { modelKeys, uploadModel, usePieceModel } from '../api/models';

interface ModelSending {
  key: number;
  file: File;
  progress: number;
  modelId?: string;
  refusal?: string;
}

const MB = 1024 * 1024;
const ACCEPTED = /\.(glb|gltf)$/i;

/** Pick or drop model files; each is sent alone and shows its own row. */
export function ModelUpload() {
  const [rows, setRows] = useState<ModelSending[]>([]);
  const [over, setOver] = useState(false);
  const picker = useRef<HTMLInputElement>(null);
  const counter = useRef(0);
  const queue = useRef(Promise.resolve());
  const qc = useQueryClient();
  const change = (key: number, c: Partial<ModelSending>) =>
    setRows((all) => all.map((r) => (r.key === key ? { ...r, ...c } : r)));

  const send = (files: File[]) => {
    const fresh = files.map((file): ModelSending => {
      counter.current += 1;
      const refusal = !ACCEPTED.test(file.name)
        ? 'Not a glTF file: choose a .glb or .gltf file.'
        : file.size > MODEL_LIMITS.maxFileBytes
          ? `Larger than ${MODEL_LIMITS.maxFileBytes / MB} MB. Export it lighter and try again.`
          : undefined;
      return { key: counter.current, file, progress: 0, refusal };
    });
    setRows((all) => [...fresh, ...all]);
    for (const row of fresh.filter((r) => !r.refusal)) {
      // One request per model, one after another, so each bar moves on its own.
      queue.current = queue.current.then(() =>
        uploadModel(row.file, (progress) => change(row.key, { progress }))
          .then((model) => {
            change(row.key, { progress: 1, modelId: model.id });
            return qc.invalidateQueries({ queryKey: modelKeys.lists() });
          })
          .catch((err) => change(row.key, { refusal: errorMessage(err) })),
      );
    }
  };

  return (
    <section aria-label="Upload models" className="mb-8">
      <div
        onDragOver={(e) => {
          e.preventDefault();
          setOver(true);
        }}
        onDragLeave={() => setOver(false)}
        onDrop={(e) => {
          e.preventDefault();
          setOver(false);
          send([...e.dataTransfer.files]);
        }}
        className={`flex flex-col items-center gap-3 rounded-2xl border-2 border-dashed px-6 py-7 text-center ${over ? 'border-pine bg-pine-wash' : 'border-line-strong bg-white'}`}
      >
        <p className="font-semibold text-ink">Drop 3D models of your pieces here</p>
        <p className="max-w-lg text-sm text-ink-soft">
          glTF files (.glb, or .gltf with its data inside), up to {MODEL_LIMITS.maxFileBytes / MB} MB each, as furniture makers
          publish them. Each is measured and lightened for the client's page.
        </p>
        <Button variant="primary" onClick={() => picker.current?.click()}>
          Choose models
        </Button>
        <input
          ref={picker}
          type="file"
          multiple
          accept=".glb,.gltf,model/gltf-binary,model/gltf+json"
          className="sr-only"
          aria-label="Model files"
          tabIndex={-1}
          onChange={(e) => {
            send([...(e.target.files ?? [])]);
            e.target.value = '';
          }}
        />
      </div>
      {rows.length > 0 && (
        <ul aria-label="Model uploads" className="mt-4 divide-y divide-line rounded-2xl border border-line bg-white">
          {rows.map((row) => (
            <SendingRow key={row.key} row={row} />
          ))}
        </ul>
      )}
    </section>
  );
}

function SendingRow({ row }: { row: ModelSending }) {
  const answer = usePieceModel(row.modelId ?? '');
  const model = answer.data?.model;
  const stage = row.refusal ? 'failed' : !row.modelId ? 'sending' : (model?.status ?? 'processing');
  const why = row.refusal ?? (model?.status === 'failed' ? model.failureReason : null);
  const percent = Math.round((stage === 'sending' ? row.progress : 1) * 100);
  const words = { sending: `Sending ${percent}%`, processing: 'Measuring…', ready: 'Ready', failed: 'Refused' }[stage];
  return (
    <li className="flex flex-col gap-1.5 px-5 py-3" aria-label={`Upload of ${row.file.name}`}>
      <div className="flex items-baseline gap-3">
        <span className="min-w-0 flex-1 truncate font-semibold" title={row.file.name}>
          {row.file.name}
        </span>
        {stage === 'ready' && model && (
          <Link to={`/models/${model.id}`} className="text-sm font-semibold text-pine hover:underline">
            Open
          </Link>
        )}
        <span role="status" className={`text-sm font-semibold ${stage === 'failed' ? 'text-clay' : 'text-ink-soft'}`}>
          {words}
        </span>
      </div>
      <div
        className="h-1.5 overflow-hidden rounded-full bg-sand"
        role="progressbar"
        aria-label={`${row.file.name} progress`}
        aria-valuemin={0}
        aria-valuemax={100}
        aria-valuenow={percent}
      >
        <div
          className={`h-full rounded-full ${stage === 'failed' ? 'bg-clay' : 'bg-pine'} ${stage === 'processing' ? 'animate-pulse' : ''}`}
          style={{ width: `${percent}%` }}
        />
      </div>
      {why && <p className="text-sm text-clay">{why}</p>}
    </li>
  );
}
