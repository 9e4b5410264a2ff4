// The room editor's Openings step: add a door, window or passage to a wall, and edit the selected
// opening's size, place along the wall and sill.
import { useState } from 'react';
import type { Opening, RoomShell } from '../../../../shared/schemas/room';
import { addOpening, flipHinge, flipSwing, removeOpening, updateOpening, type Command } from '../../../../shared/commands';
import { layoutShellWalls } from '../../../../shared/geometry/walls';
import { DOOR_PRESETS, PASSAGE_PRESETS, WINDOW_PRESETS } from '../../../../shared/catalogue/openings';
import { formatLength, type LengthUnit } from '../../../../shared/units/length';
import { Button } from '../../../components/ui/button';
import { inputClass } from '../../../components/ui/field';
import { LengthField } from '../../../components/ui/length-field';
import type { Selection } from './plan/plan-geometry';
import type { FieldRun } from './outline-panel';

const TYPE_WORD: Record<Opening['type'], string> = { door: 'Door', window: 'Window', passage: 'Passage' };

export function OpeningsPanel({
  shell,
  run,
  commit,
  unit,
  readOnly,
  selection,
  onSelect,
  newId,
}: {
  shell: RoomShell;
  run: (c: Command) => boolean;
  commit: FieldRun;
  unit: LengthUnit;
  readOnly: boolean;
  selection: Selection;
  onSelect: (s: Selection) => void;
  newId: (prefix: string) => string;
}) {
  const walls = layoutShellWalls(shell);
  const selectedWall =
    selection?.kind === 'wall'
      ? selection.index
      : selection?.kind === 'opening'
        ? (shell.openings.find((o) => o.id === selection.id)?.wall ?? 0)
        : 0;
  const [wall, setWall] = useState<number>(selectedWall);
  const wallIndex = selection?.kind === 'wall' ? selection.index : wall;
  const target = walls[wallIndex] ?? walls[0];
  const selected = selection?.kind === 'opening' ? shell.openings.find((o) => o.id === selection.id) : undefined;

  const add = (type: Opening['type']) => {
    const id = newId(type);
    const preset = type === 'door' ? DOOR_PRESETS[2] : type === 'window' ? WINDOW_PRESETS[1] : PASSAGE_PRESETS[0];
    const width = Math.min(preset.width, Math.max(100, target.lengthMm - 200));
    const offset = Math.max(60, Math.round((target.lengthMm - width) / 2));
    const base = { id, wall: target.index, offset, width, height: Math.min(preset.height, shell.wallHeight - 50) };
    const opening: Opening =
      type === 'door'
        ? { ...base, type, hinge: 'start', swing: 'in' }
        : type === 'window'
          ? {
              ...base,
              type,
              sill: (preset as (typeof WINDOW_PRESETS)[number]).sill,
              height: Math.min(preset.height, shell.wallHeight - (preset as (typeof WINDOW_PRESETS)[number]).sill - 100),
            }
          : { ...base, type };
    if (run(addOpening(opening))) onSelect({ kind: 'opening', id });
  };

  return (
    <div className="flex flex-col gap-5">
      {!readOnly && (
        <div className="flex flex-col gap-3 rounded-xl border border-line bg-white p-4">
          <label className="flex flex-col gap-1.5 text-sm font-semibold">
            On wall
            <select
              className={inputClass}
              value={target.index}
              onChange={(e) => {
                setWall(Number(e.target.value));
                onSelect({ kind: 'wall', index: Number(e.target.value) });
              }}
            >
              {walls.map((w) => (
                <option key={w.index} value={w.index}>
                  Wall {w.index + 1} · {formatLength(w.lengthMm, unit)}
                </option>
              ))}
            </select>
          </label>
          <div className="flex flex-wrap gap-2">
            <Button size="sm" variant="primary" onClick={() => add('door')}>
              Add door
            </Button>
            <Button size="sm" variant="primary" onClick={() => add('window')}>
              Add window
            </Button>
            <Button size="sm" variant="primary" onClick={() => add('passage')}>
              Add passage
            </Button>
          </div>
          <p className="text-xs text-ink-faint">Or click a wall on the plan first. Drag an opening along its wall to place it.</p>
        </div>
      )}

      {selected ? (
        <OpeningProperties
          key={selected.id}
          opening={selected}
          shell={shell}
          run={run}
          commit={commit}
          unit={unit}
          readOnly={readOnly}
          onRemoved={() => onSelect(null)}
        />
      ) : (
        <ul className="flex flex-col gap-1.5">
          {shell.openings.length === 0 && <li className="text-sm text-ink-soft">No openings yet.</li>}
          {shell.openings.map((o) => (
            <li key={o.id}>
              <button
                type="button"
                className="w-full rounded-lg border border-line bg-white px-3 py-2 text-left text-sm hover:border-pine"
                onClick={() => onSelect({ kind: 'opening', id: o.id })}
              >
                <span className="font-semibold">{TYPE_WORD[o.type]}</span> on wall {o.wall + 1} · {formatLength(o.width, unit)}{' '}
                wide
              </button>
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}

function OpeningProperties({
  opening,
  shell,
  run,
  commit,
  unit,
  readOnly,
  onRemoved,
}: {
  opening: Opening;
  shell: RoomShell;
  run: (c: Command) => boolean;
  commit: FieldRun;
  unit: LengthUnit;
  readOnly: boolean;
  onRemoved: () => void;
}) {
  const set = (patch: Parameters<typeof updateOpening>[1]) => !readOnly && run(updateOpening(opening.id, patch));
  const field = (patch: Parameters<typeof updateOpening>[1]) => commit(updateOpening(opening.id, patch));
  const presets = opening.type === 'door' ? DOOR_PRESETS : opening.type === 'window' ? WINDOW_PRESETS : PASSAGE_PRESETS;
  return (
    <div className="flex flex-col gap-4">
      <h3 className="font-bold">
        {TYPE_WORD[opening.type]} on wall {opening.wall + 1}
      </h3>
      <div>
        <span className="text-sm font-semibold">Common sizes</span>
        <div className="mt-1.5 flex flex-wrap gap-1.5">
          {presets.map((p) => (
            <button
              key={p.label}
              type="button"
              disabled={readOnly}
              title={p.source}
              onClick={() =>
                set({ width: p.width, height: p.height, ...('sill' in p ? { sill: (p as { sill: number }).sill } : {}) })
              }
              className={`rounded-full border px-2.5 py-1 text-xs font-semibold ${Math.abs(p.width - opening.width) < 0.5 ? 'border-pine bg-pine-wash text-pine-dark' : 'border-line-strong bg-white hover:bg-sand'}`}
            >
              {p.label}
            </button>
          ))}
        </div>
      </div>
      <div className="grid grid-cols-2 gap-3">
        <LengthField
          commit="blur"
          label="Width"
          unit={unit}
          valueMm={opening.width}
          disabled={readOnly}
          onChange={(v) => (v ? field({ width: v }) : 'Enter a width.')}
        />
        <LengthField
          commit="blur"
          label="Height"
          unit={unit}
          valueMm={opening.height}
          disabled={readOnly}
          onChange={(v) => (v ? field({ height: v }) : 'Enter a height.')}
        />
        <LengthField
          commit="blur"
          label="From wall start"
          unit={unit}
          valueMm={opening.offset}
          disabled={readOnly}
          onChange={(v) => (v !== null ? field({ offset: v }) : 'Enter a distance.')}
        />
        {opening.type === 'window' && (
          <LengthField
            commit="blur"
            label="Sill height"
            unit={unit}
            valueMm={opening.sill}
            disabled={readOnly}
            onChange={(v) => (v !== null ? field({ sill: v }) : 'Enter a height.')}
          />
        )}
      </div>
      {opening.type === 'window' && opening.sill + opening.height > shell.wallHeight - 50 && (
        <p className="text-sm text-ochre">The window’s head is close to the ceiling.</p>
      )}
      {opening.type === 'door' && !readOnly && (
        <div className="flex flex-wrap gap-2">
          <Button size="sm" onClick={() => run(flipHinge(opening.id))}>
            Hinge on the other side
          </Button>
          <Button size="sm" onClick={() => run(flipSwing(opening.id))}>
            {opening.swing === 'in' ? 'Swing out of the room' : 'Swing into the room'}
          </Button>
        </div>
      )}
      {!readOnly && (
        <Button size="sm" variant="danger" onClick={() => run(removeOpening(opening.id)) && onRemoved()}>
          Remove {opening.type}
        </Button>
      )}
    </div>
  );
}
