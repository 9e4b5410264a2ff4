// A kind's small drawing: its top view from the same parts as its 3D form, at the catalogue's
// size for the kind, fitted into a square. Used in the Furnish panel's kind list and catalogue.
import { memo, useMemo, useState } from 'react';
import { CATALOGUE } from '../../../../shared/catalogue/catalogue';
import {
  KIND_LABELS,
  KIND_SETTINGS,
  PIECE_KINDS,
  type PieceKind,
  type PieceSettings,
} from '../../../../shared/schemas/piece-kind';
import { inputClass } from '../../../components/ui/field';
import { PartShape, topViewParts } from './plan/plan-piece-forms';
import { planColour } from './plan/plan-style';

/** The box a kind is drawn in when no piece gives one: its first catalogue entry's. */
export function kindBox(kind: PieceKind): { width: number; depth: number; height: number } {
  const entry = CATALOGUE.find((e) => e.kind === kind);
  return entry ? { width: entry.width, depth: entry.depth, height: entry.height } : { width: 1000, depth: 600, height: 800 };
}

export const KindDrawing = memo(function KindDrawing({
  kind,
  settings,
  box,
  size = 40,
}: {
  kind: PieceKind;
  settings?: PieceSettings;
  box?: { width: number; depth: number; height: number };
  size?: number;
}) {
  const b = box ?? kindBox(kind);
  const parts = useMemo(() => topViewParts({ kind, settings, ...b }), [kind, settings, b.width, b.depth, b.height]); // eslint-disable-line react-hooks/exhaustive-deps
  const side = Math.max(b.width, b.depth) * 1.08;
  return (
    <svg
      viewBox={`${-side / 2} ${-side / 2} ${side} ${side}`}
      width={size}
      height={size}
      aria-hidden="true"
      className="shrink-0 rounded bg-paper"
    >
      <rect
        x={-b.width / 2}
        y={-b.depth / 2}
        width={b.width}
        height={b.depth}
        fill={planColour.newPieceFill}
        stroke={planColour.pieceStroke}
        strokeWidth={side / 70}
      />
      {parts.map((part, i) => (
        <PartShape
          key={i}
          part={part}
          fill={
            part.slot === 'own'
              ? (part.colour ?? planColour.newPieceFill)
              : part.slot === 'accent'
                ? planColour.accentPartFill
                : planColour.existingPieceFill
          }
          stroke={side / 110}
        />
      ))}
    </svg>
  );
});

/** The piece's kind with its drawing, a short searchable list to change it, and the kind's settings. */
export function KindPicker({
  kind,
  settings,
  box,
  readOnly,
  onKind,
  onSettings,
}: {
  kind: PieceKind;
  settings: PieceSettings;
  box: { width: number; depth: number; height: number };
  readOnly: boolean;
  onKind: (kind: PieceKind) => void;
  onSettings: (settings: PieceSettings) => void;
}) {
  const [open, setOpen] = useState(false);
  const [q, setQ] = useState('');
  const shown = PIECE_KINDS.filter((k) => KIND_LABELS[k].toLowerCase().includes(q.trim().toLowerCase()));
  return (
    <div className="flex flex-col gap-2">
      <div className="flex items-center gap-3">
        <KindDrawing kind={kind} settings={settings} box={box} size={56} />
        <div className="min-w-0 flex-1">
          <div className="text-xs font-semibold text-ink-faint">Kind</div>
          <div className="truncate text-sm font-semibold">{KIND_LABELS[kind]}</div>
        </div>
        {!readOnly && (
          <button
            type="button"
            className="text-sm font-semibold text-pine hover:underline"
            aria-expanded={open}
            onClick={() => setOpen((o) => !o)}
          >
            {open ? 'Done' : 'Change kind'}
          </button>
        )}
      </div>
      {open && (
        <div className="flex flex-col gap-1.5 rounded-lg border border-line bg-paper p-2">
          <label>
            <span className="sr-only">Find a kind</span>
            <input
              className={inputClass}
              type="search"
              placeholder="Find a kind, e.g. lamp"
              value={q}
              onChange={(e) => setQ(e.target.value)}
              autoFocus
            />
          </label>
          <ul className="flex max-h-56 flex-col gap-1 overflow-y-auto" aria-label="Kinds">
            {shown.map((k) => (
              <li key={k}>
                <button
                  type="button"
                  aria-pressed={k === kind}
                  onClick={() => {
                    onKind(k);
                    setOpen(false);
                  }}
                  className="flex w-full items-center gap-2 rounded-md border border-transparent bg-white px-2 py-1 text-left text-sm hover:border-pine aria-pressed:border-pine"
                >
                  <KindDrawing kind={k} size={32} />
                  {KIND_LABELS[k]}
                </button>
              </li>
            ))}
          </ul>
        </div>
      )}
      <KindSettings kind={kind} settings={settings} readOnly={readOnly} onSettings={onSettings} />
    </div>
  );
}

const CHOICES: Partial<Record<keyof PieceSettings, [string, string][]>> = {
  arms: [
    ['both', 'Arms'],
    ['none', 'No arms'],
  ],
  base: [
    ['legs', 'On legs'],
    ['plinth', 'On a plinth'],
  ],
  hand: [
    ['left', 'Return on the left'],
    ['right', 'Return on the right'],
  ],
  top: [
    ['rectangular', 'Square corners'],
    ['round', 'Round'],
  ],
  fronts: [
    ['doors', 'Doors'],
    ['drawers', 'Drawers'],
  ],
};
const NUMBERS: Partial<Record<keyof PieceSettings, { label: string; min: number; max: number }>> = {
  count: { label: 'Doors, drawers or shelves', min: 1, max: 12 },
  chairs: { label: 'Chairs', min: 2, max: 12 },
  headboardHeight: { label: 'Headboard top (mm)', min: 0, max: 2000 },
};

/** The settings the kind takes, each a small field; a change replaces that one setting. */
function KindSettings({
  kind,
  settings,
  readOnly,
  onSettings,
}: {
  kind: PieceKind;
  settings: PieceSettings;
  readOnly: boolean;
  onSettings: (s: PieceSettings) => void;
}) {
  const keys = KIND_SETTINGS[kind];
  if (keys.length === 0) return null;
  return (
    <div className="grid grid-cols-2 gap-2">
      {keys.map((key) => {
        const choices = CHOICES[key];
        if (choices) {
          return (
            <label key={key} className="flex flex-col gap-1 text-xs font-semibold">
              {key === 'hand' ? 'Corner' : key[0].toUpperCase() + key.slice(1)}
              <select
                className={`${inputClass} h-8 px-2`}
                disabled={readOnly}
                value={String(settings[key] ?? '')}
                onChange={(e) => onSettings({ ...settings, [key]: e.target.value || undefined })}
              >
                <option value="">As drawn</option>
                {choices.map(([v, label]) => (
                  <option key={v} value={v}>
                    {label}
                  </option>
                ))}
              </select>
            </label>
          );
        }
        if (key === 'footboard') {
          return (
            <label key={key} className="flex items-center gap-2 text-xs font-semibold">
              <input
                type="checkbox"
                disabled={readOnly}
                checked={settings.footboard === true}
                onChange={(e) => onSettings({ ...settings, footboard: e.target.checked })}
              />
              Footboard
            </label>
          );
        }
        const n = NUMBERS[key]!;
        return (
          <label key={key} className="flex flex-col gap-1 text-xs font-semibold">
            {n.label}
            <input
              className={`${inputClass} h-8 px-2`}
              type="number"
              min={n.min}
              max={n.max}
              disabled={readOnly}
              defaultValue={settings[key] === undefined ? '' : String(settings[key])}
              onBlur={(e) => {
                const v = e.target.value === '' ? undefined : Math.round(Number(e.target.value));
                if (v === undefined || (v >= n.min && v <= n.max)) onSettings({ ...settings, [key]: v });
              }}
            />
          </label>
        );
      })}
    </div>
  );
}
