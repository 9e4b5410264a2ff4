// The room editor's Outline step: ceiling height, wall thickness, whether it is a child's room and
// each wall's length, plus measuring walls in turn ("420 l 135") to make a new outline.
import { useMemo, useState, type KeyboardEvent } from 'react';
import type { RoomShell } from '../../../../shared/schemas/room';
import {
  closeOutlineGap,
  setChildRoom,
  setOutline,
  setWallHeight,
  setWallLength,
  setWallThickness,
  type Command,
} from '../../../../shared/commands';
import { outlineFromWalk, type WalkStep } from '../../../../shared/geometry/outline';
import { layoutShellWalls } from '../../../../shared/geometry/walls';
import { formatLength, parseLength, type LengthUnit } from '../../../../shared/units/length';
import { Button } from '../../../components/ui/button';
import { inputClass } from '../../../components/ui/field';
import { LengthField } from '../../../components/ui/length-field';
import { Notice } from '../../../components/ui/layout';
import { useCommitText } from '../../../components/ui/use-commit-text';
import type { Selection } from './plan/plan-geometry';

/** A gap smaller than this between the last corner and the first counts as closed (plan mm). */
export const CLOSED_GAP_MM = 1;
/** A wall typed as measured: its length, then the corner at its end (90 = square, 135 = splayed). */
export interface MeasuredWall {
  lengthMm: number;
  turn: 'right' | 'left';
  cornerDeg: number;
}

export const toWalk = (walls: readonly MeasuredWall[]): WalkStep[] =>
  walls.map((w) => ({ lengthMm: w.lengthMm, turn: w.turn, turnDeg: 180 - w.cornerDeg }));

/** Reads "420", "420 l 135", "4.2m r", "13' 9\" l" in the user's unit: a length, then an optional turn and corner angle. */
export function parseMeasuredWall(
  text: string,
  unit: LengthUnit,
): { ok: true; wall: MeasuredWall } | { ok: false; message: string } {
  const match = text.trim().match(/^(.*?)(?:\s+([lr]|left|right)\b\s*(\d+(?:\.\d+)?)?\s*°?)?$/i);
  if (!match || !match[1])
    return { ok: false, message: 'Type a length, e.g. 420 or 4.2m, then optionally l or r and the corner angle.' };
  const length = parseLength(match[1], unit);
  if (!length.ok) return length;
  if (length.mm <= 0) return { ok: false, message: 'A wall needs a length above zero.' };
  const turn = match[2]?.toLowerCase().startsWith('l') ? 'left' : 'right';
  const cornerDeg = match[3] ? Number(match[3]) : 90;
  if (!(cornerDeg > 0 && cornerDeg < 180))
    return { ok: false, message: 'A corner angle is between 0° and 180° (90° is square).' };
  return { ok: true, wall: { lengthMm: length.mm, turn, cornerDeg } };
}

/** Runs a command for a field: null when done, else the sentence saying why not (shown beside the field). */
export type FieldRun = (c: Command, o?: { gesture?: string }) => string | null;

export function OutlinePanel({
  shell,
  run,
  commit,
  unit,
  readOnly,
  selection,
  onSelect,
  onPreview,
  onDraw,
}: {
  shell: RoomShell;
  run: (c: Command) => boolean;
  commit: FieldRun;
  unit: LengthUnit;
  readOnly: boolean;
  selection: Selection;
  onSelect: (s: Selection) => void;
  onPreview: (points: [number, number][] | null) => void;
  onDraw: () => void;
}) {
  const [measuring, setMeasuring] = useState<MeasuredWall[] | null>(null);
  const walls = useMemo(() => layoutShellWalls(shell), [shell]);

  if (measuring) {
    return (
      <MeasureWalls
        walls={measuring}
        unit={unit}
        onChange={(w) => {
          setMeasuring(w);
          const r = w.length > 0 ? outlineFromWalk(toWalk(w)) : null;
          onPreview(r ? [...r.corners, r.endMm] : null);
        }}
        onCancel={() => {
          setMeasuring(null);
          onPreview(null);
        }}
        onUse={(command) => {
          if (run(command)) {
            setMeasuring(null);
            onPreview(null);
          }
        }}
      />
    );
  }

  return (
    <div className="flex flex-col gap-5">
      <div className="grid grid-cols-2 gap-3">
        <LengthField
          commit="blur"
          label="Ceiling height"
          unit={unit}
          valueMm={shell.wallHeight}
          disabled={readOnly}
          onChange={(v) => (v ? commit(setWallHeight(v)) : 'Enter a height.')}
        />
        <LengthField
          commit="blur"
          label="Wall thickness"
          unit={unit}
          valueMm={shell.wallThickness}
          disabled={readOnly}
          onChange={(v) => (v ? commit(setWallThickness(v)) : 'Enter a thickness.')}
          hint="All walls"
        />
      </div>
      <label className="flex items-start gap-2 text-sm text-ink">
        <input
          type="checkbox"
          className="mt-1"
          disabled={readOnly}
          checked={shell.childRoom}
          onChange={(e) => commit(setChildRoom(e.target.checked))}
        />
        <span>
          A child’s room
          <span className="block text-xs text-ink-faint">The check then warns of pieces a child could climb to a window.</span>
        </span>
      </label>
      <div>
        <h3 className="mb-2 text-sm font-semibold text-ink">Walls</h3>
        <ol className="flex flex-col gap-1.5">
          {walls.map((w) => (
            <li key={w.index}>
              <WallRow
                index={w.index}
                lengthMm={w.lengthMm}
                thicknessOverride={shell.wallThicknesses?.[w.index] ?? null}
                unit={unit}
                readOnly={readOnly}
                selected={selection?.kind === 'wall' && selection.index === w.index}
                onFocus={() => onSelect({ kind: 'wall', index: w.index })}
                onLength={(mm) => commit(setWallLength(w.index, mm))}
                onThickness={(mm) => commit(setWallThickness(mm, w.index))}
              />
            </li>
          ))}
        </ol>
        <p className="mt-2 text-xs text-ink-faint">
          Lengths are the inside faces, as you measure them. Changing one wall keeps every corner’s angle.
        </p>
      </div>
      {!readOnly && (
        <div className="flex flex-wrap gap-2">
          <Button size="sm" onClick={() => setMeasuring([])}>
            Type the walls afresh
          </Button>
          <Button size="sm" onClick={onDraw}>
            Draw by clicking corners
          </Button>
        </div>
      )}
    </div>
  );
}

function WallRow({
  index,
  lengthMm,
  thicknessOverride,
  unit,
  readOnly,
  selected,
  onFocus,
  onLength,
  onThickness,
}: {
  index: number;
  lengthMm: number;
  thicknessOverride: number | null;
  unit: LengthUnit;
  readOnly: boolean;
  selected: boolean;
  onFocus: () => void;
  onLength: (mm: number) => string | null;
  onThickness: (mm: number | null) => string | null;
}) {
  const length = useCommitText<number>({
    value: lengthMm,
    format: (mm) => formatLength(mm, unit),
    parse: (text) => {
      const parsed = parseLength(text, unit);
      if (!parsed.ok) return parsed;
      return parsed.mm > 0 ? { ok: true, value: parsed.mm } : { ok: false, message: 'A wall needs a length above zero.' };
    },
    equal: (a, b) => Math.abs(a - b) <= 0.05,
    onCommit: onLength,
  });
  const errorId = `wall-length-${index}-error`;
  return (
    <div className={`rounded-lg border px-3 py-2 ${selected ? 'border-pine bg-pine-wash/50' : 'border-line bg-white'}`}>
      <div className="flex items-center gap-2">
        <label className="shrink-0 text-sm font-semibold whitespace-nowrap text-ink-soft" htmlFor={`wall-length-${index}`}>
          Wall {index + 1}
        </label>
        <input
          id={`wall-length-${index}`}
          className={`${inputClass} h-9 min-w-0 px-2`}
          {...length.inputProps}
          disabled={readOnly}
          onFocus={onFocus}
          inputMode="decimal"
          autoComplete="off"
          aria-invalid={length.error ? true : undefined}
          aria-describedby={length.error ? errorId : undefined}
        />
        <label
          className="flex shrink-0 items-center gap-1 text-xs whitespace-nowrap text-ink-faint"
          title="This wall’s own thickness"
        >
          <input
            type="checkbox"
            disabled={readOnly}
            checked={thicknessOverride !== null}
            onChange={(e) => onThickness(e.target.checked ? 200 : null)}
          />
          own thickness
        </label>
      </div>
      {thicknessOverride !== null && (
        <div className="mt-2">
          <LengthField
            commit="blur"
            label={`Wall ${index + 1} thickness`}
            unit={unit}
            valueMm={thicknessOverride}
            disabled={readOnly}
            onChange={(v) => (v ? onThickness(v) : 'Enter a thickness.')}
          />
        </div>
      )}
      {length.error && (
        <p id={errorId} className="mt-1 text-sm text-clay" role="alert">
          {length.error}
        </p>
      )}
    </div>
  );
}

export function MeasureWalls({
  walls,
  unit,
  onChange,
  onCancel,
  onUse,
  autoFocus = true,
}: {
  walls: MeasuredWall[];
  unit: LengthUnit;
  onChange: (w: MeasuredWall[]) => void;
  onCancel: () => void;
  onUse: (command: Command) => void;
  autoFocus?: boolean;
}) {
  const [entry, setEntry] = useState('');
  const [error, setError] = useState<string | null>(null);
  const walk = useMemo(() => (walls.length > 0 ? outlineFromWalk(toWalk(walls)) : null), [walls]);
  const gap = walk?.closure.gapMm ?? 0;

  const add = (e: KeyboardEvent<HTMLInputElement>) => {
    if (e.key !== 'Enter') return;
    e.preventDefault();
    const parsed = parseMeasuredWall(entry, unit);
    if (!parsed.ok) {
      setError(parsed.message);
      return;
    }
    setError(null);
    setEntry('');
    onChange([...walls, parsed.wall]);
  };
  const update = (i: number, patch: Partial<MeasuredWall>) => onChange(walls.map((w, j) => (j === i ? { ...w, ...patch } : w)));
  const corners = walk?.corners ?? [];

  return (
    <div className="flex flex-col gap-4">
      <p className="text-sm text-ink-soft">
        Walk round the room and type each wall as you measured it, then Enter. After the length you can add the turn:
        <strong> r</strong> or <strong>l</strong> and the corner’s angle (90° is square, 135° a splayed corner), e.g.{' '}
        <code className="rounded bg-sand px-1">350 l 135</code>.
      </p>
      <ol className="flex flex-col gap-1.5">
        {walls.map((w, i) => (
          <li key={i} className="flex flex-col gap-1.5 rounded-lg border border-line bg-white px-2 py-1.5 text-sm">
            <div className="flex items-center gap-2">
              <span className="shrink-0 font-semibold whitespace-nowrap text-ink-soft">Wall {i + 1}</span>
              <span className="min-w-0 flex-1 whitespace-nowrap tabular-nums">{formatLength(w.lengthMm, unit)}</span>
              <button
                type="button"
                className="rounded px-1.5 text-ink-faint hover:bg-sand hover:text-clay"
                aria-label={`Remove wall ${i + 1}`}
                onClick={() => onChange(walls.filter((_, j) => j !== i))}
              >
                ×
              </button>
            </div>
            <div className="flex items-center gap-2">
              <label className="sr-only" htmlFor={`turn-${i}`}>
                Turn after wall {i + 1}
              </label>
              <select
                id={`turn-${i}`}
                className={`${inputClass} h-8 min-w-0 px-2 text-sm`}
                value={w.turn}
                onChange={(e) => update(i, { turn: e.target.value as MeasuredWall['turn'] })}
              >
                <option value="right">then right</option>
                <option value="left">then left</option>
              </select>
              <label className="sr-only" htmlFor={`corner-${i}`}>
                Corner angle after wall {i + 1}
              </label>
              <span className="w-16 shrink-0">
                <input
                  id={`corner-${i}`}
                  className={`${inputClass} h-8 px-2 text-sm`}
                  inputMode="decimal"
                  value={w.cornerDeg}
                  onChange={(e) =>
                    Number(e.target.value) > 0 && Number(e.target.value) < 180 && update(i, { cornerDeg: Number(e.target.value) })
                  }
                />
              </span>
              <span className="text-ink-faint">°</span>
            </div>
          </li>
        ))}
      </ol>
      <div>
        <label htmlFor="next-wall" className="text-sm font-semibold">
          Wall {walls.length + 1}
        </label>
        <input
          id="next-wall"
          className={`${inputClass} mt-1`}
          placeholder="e.g. 420, or 350 l 135"
          value={entry}
          onChange={(e) => setEntry(e.target.value)}
          onKeyDown={add}
          autoFocus={autoFocus}
          aria-invalid={error ? true : undefined}
        />
        {error && (
          <p className="mt-1 text-sm text-clay" role="alert">
            {error}
          </p>
        )}
      </div>
      {walls.length >= 3 &&
        (gap < CLOSED_GAP_MM ? (
          <Notice tone="ok">The walls close. {walls.length} walls, ready to use.</Notice>
        ) : (
          <Notice tone="warn">
            The last corner misses the first by <strong>{formatLength(gap, unit)}</strong>. Tapes and walls are never perfect:
            close it by adjusting the last walls, or check a measurement.
          </Notice>
        ))}
      <div className="flex flex-wrap gap-2">
        {walls.length >= 3 && gap >= CLOSED_GAP_MM && (
          <Button variant="primary" size="sm" onClick={() => onUse(closeOutlineGap(toWalk(walls)))}>
            Close the outline
          </Button>
        )}
        {walls.length >= 3 && gap < CLOSED_GAP_MM && (
          <Button variant="primary" size="sm" onClick={() => onUse(setOutline(corners.slice(0, walls.length)))}>
            Use these walls
          </Button>
        )}
        <Button size="sm" variant="quiet" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </div>
  );
}
