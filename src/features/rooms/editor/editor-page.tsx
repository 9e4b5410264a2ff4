// The room editor's page: the step bar (outline, openings, furnish, finishes, check), the plan and the
// 3D preview side by side or by turns, the options bar, the keys and what saving says. The editing
// itself lives in use-room-editor.ts; each step's panel in its own file.
import {
  lazy,
  Suspense,
  useCallback,
  useEffect,
  useMemo,
  useRef,
  useState,
  type KeyboardEvent as ReactKeyboardEvent,
} from 'react';
import { Link } from 'react-router';
import type { Command } from '../../../../shared/commands';
import type { Finding } from '../../../../shared/analysis/fit/finding';
import type { Piece } from '../../../../shared/schemas/option';
import type { LengthUnit } from '../../../../shared/units/length';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { FormDialog } from '../../../components/ui/form-dialog';
import { Notice, Spinner } from '../../../components/ui/layout';
import { errorMessage } from '../../../lib/api';
import { useCanEdit } from '../../../lib/session';
import { useRoom, type RoomDetail } from '../api/rooms';
import { formatLength } from '../../../../shared/units/length';
import { CheckPanel } from './check/check-panel';
import { useFitCheck } from './check/use-fit-check';
import { useModelBudget } from './check/use-model-budget';
import { useSeenMarks } from './check/use-seen-marks';
import { FindingsBadge } from './check/findings-badge';
import { FinishesPanel, targetOf } from './finishes-panel';
import { sceneFinishesFor } from './scene-finishes';
import { sceneModelsFor } from './scene-models';
import type { Finish } from '../../../../shared/schemas/finish';
import { FurnishPanel } from './furnish-panel';
import type { PieceModel } from '../../../../shared/schemas/piece-model';
import { OpeningsPanel } from './openings-panel';
import { OptionsBar } from './options-bar';
import { OutlinePanel } from './outline-panel';
import { PlanView } from './plan/plan-view';
import { roomCentre, type Selection } from './plan/plan-geometry';
import { EDITOR_STEPS, type EditorStep } from './steps';
import { useRoomEditor, type Frozen, type SaveState } from './use-room-editor';
import { SPLIT_KEY_STEP, SPLIT_MAX, SPLIT_MIN, useEditorView } from './use-editor-view';
import { useEditorPlace } from './use-editor-place';
import { optionLabel } from '../../../../shared/schemas/room-api';
import { refusalText } from './refusal-text';
import { EDITOR_KEYS, keyFor, type KeyContext } from './editor-keys';

const RoomView = lazy(() => import('../../../scene/room-view'));

/** One empty list, so an editor without models keeps the same props from render to render. */
const NO_MODELS: PieceModel[] = [];

export function EditorPage({
  projectId,
  roomId,
  finishes = [],
  models = NO_MODELS,
}: {
  projectId: string;
  roomId: string;
  finishes?: Finish[];
  /** The studio's piece models, for a piece to wear in Furnish. */
  models?: PieceModel[];
}) {
  const room = useRoom(roomId);
  const canEdit = useCanEdit();
  if (room.isPending)
    return (
      <div className="px-6">
        <Spinner label="Opening the room…" />
      </div>
    );
  if (room.isError) {
    return (
      <div className="mx-auto flex max-w-6xl flex-col gap-4 px-6 py-10">
        <Notice tone="error">{errorMessage(room.error)}</Notice>
        <Link to={`/projects/${projectId}`} className="font-semibold text-pine">
          Back to the project
        </Link>
      </div>
    );
  }
  return <Editor key={roomId} projectId={projectId} detail={room.data} readOnly={!canEdit} finishes={finishes} models={models} />;
}

/** One empty list for an option-less moment, so hooks keyed on the pieces do not re-run each render. */
const NO_PIECES: Piece[] = [];
/** The same for the findings before the first check answers. */
const NO_FINDINGS: Finding[] = [];

const SAVE_TEXT: Record<SaveState, string> = {
  saved: 'All changes saved',
  unsaved: 'Unsaved changes',
  saving: 'Saving…',
  retrying: 'Cannot reach the server — trying again',
  conflict: 'Not saved: see above',
};

function Editor({
  projectId,
  detail,
  readOnly,
  finishes,
  models,
}: {
  projectId: string;
  detail: RoomDetail;
  readOnly: boolean;
  finishes: Finish[];
  models: PieceModel[];
}) {
  // What the decided project stands on, from the room's live answer (Mark as decided and Reopen change it).
  const frozenKey = detail.options
    .filter((o) => o.decided)
    .map((o) => o.id)
    .join(',');
  const frozen = useMemo<Frozen>(() => ({ optionIds: new Set(frozenKey ? frozenKey.split(',') : []) }), [frozenKey]);
  const editor = useRoomEditor(detail, readOnly, frozen);
  const [duplicating, setDuplicating] = useState<{ busy: boolean; error: string | null }>({ busy: false, error: null });
  const { step, setStep, optionId, setOptionId, walkwayMm, setWalkwayMm } = useEditorPlace(
    detail.room.id,
    detail.options.map((o) => o.id),
    readOnly,
  );
  const [selection, setSelection] = useState<Selection>(null);
  const { layout, setLayout, split, setSplit, nudgeSplit, unit, setUnit } = useEditorView();
  const [drawing, setDrawing] = useState(false);
  const [preview, setPreview] = useState<[number, number][] | null>(null);
  const [help, setHelp] = useState(false);
  const [renaming, setRenaming] = useState(false);
  const splitHost = useRef<HTMLDivElement>(null);
  const [chosenFinding, setChosenFinding] = useState<number | null>(null);
  const [finishTarget, setFinishTarget] = useState<'floor' | 'ceiling' | 'walls' | 'wall' | 'piece'>('floor');

  const option = editor.doc.options[optionId] ?? Object.values(editor.doc.options)[0];
  const activeOptionId = editor.doc.options[optionId] ? optionId : Object.keys(editor.doc.options)[0];
  const pieces = option?.pieces ?? NO_PIECES;
  const shellFrozen = frozen.optionIds.size > 0;
  const optionFrozen = frozen.optionIds.has(activeOptionId);
  const shellReadOnly = readOnly || shellFrozen;
  const optionReadOnly = readOnly || optionFrozen;
  const chosenLabels = editor.options.filter((o) => frozen.optionIds.has(o.id)).map((o) => optionLabel(o.position, o.name));
  const duplicateToChange = async () => {
    setDuplicating({ busy: true, error: null });
    try {
      const id = await editor.addOption(activeOptionId);
      setOptionId(id);
      setSelection(null);
      setDuplicating({ busy: false, error: null });
    } catch (err) {
      setDuplicating({ busy: false, error: errorMessage(err) });
    }
  };
  const fit = useFitCheck(editor.doc.shell, pieces, walkwayMm);
  const findings = fit?.findings ?? NO_FINDINGS;
  const seenMarks = useSeenMarks(editor, activeOptionId, findings);
  const finding = chosenFinding !== null ? findings[chosenFinding] : undefined;
  const highlight =
    step === 'check' && finding
      ? {
          pieceIds: finding.pieces,
          gap:
            finding.between && finding.measuredMm !== undefined
              ? { a: finding.between[0], b: finding.between[1], label: formatLength(finding.measuredMm, unit) }
              : undefined,
          zone: finding.zone,
        }
      : null;
  // Pieces of findings marked as seen are not flagged: the designer means them.
  const flaggedPieceIds = step === 'check' ? [...new Set(seenMarks.open.flatMap((f) => f.finding.pieces))] : [];
  const finishIndex = useMemo(() => new Map(finishes.map((f) => [f.id, f])), [finishes]);
  const sceneFinishes = useMemo(() => sceneFinishesFor(option, finishIndex), [option, finishIndex]);
  const modelIndex = useMemo(() => new Map(models.map((m) => [m.id, m])), [models]);
  const sceneModels = useMemo(() => sceneModelsFor(pieces, modelIndex), [pieces, modelIndex]);
  const modelBudget = useModelBudget(editor.doc.shell, step === 'check' ? pieces : NO_PIECES, modelIndex, sceneFinishes);
  const select = useCallback((s: Selection) => {
    setSelection(s);
    const t = targetOf(s);
    if (t) setFinishTarget(t);
  }, []);
  const newId = useCallback((prefix: string) => `${prefix}-${crypto.randomUUID().slice(0, 8)}`, []);
  const viewCentreRef = useRef<[number, number] | null>(null);
  const viewCentre = useCallback((): [number, number] => viewCentreRef.current ?? roomCentre(shellRef.current), []);
  const shellRef = useRef(editor.doc.shell);
  shellRef.current = editor.doc.shell;
  const commitField = useCallback(
    (command: Command, options?: { gesture?: string }) => {
      const failure = editor.attempt(command, options);
      return failure ? refusalText(failure, shellRef.current, unit) : null;
    },
    [editor.attempt, unit], // eslint-disable-line react-hooks/exhaustive-deps
  );

  // Keys for the whole editor, unless the designer is typing in a field: the first entry of the
  // keymap that takes the press and applies now runs.
  useEffect(() => {
    const onKey = (e: KeyboardEvent) => {
      const target = e.target as HTMLElement;
      if (target.closest('input, textarea, select, [contenteditable=true], dialog[open]')) return;
      const context: KeyContext = {
        editor,
        readOnly,
        optionId: activeOptionId,
        piece: selection?.kind === 'piece' ? pieces.find((p) => p.id === selection.id) : undefined,
        opening: selection?.kind === 'opening' ? editor.doc.shell.openings.find((o) => o.id === selection.id) : undefined,
        clearSelection: () => setSelection(null),
        stopDrawing: () => setDrawing(false),
        showKeys: () => setHelp(true),
      };
      const entry = keyFor(e, context);
      if (!entry?.run) return;
      if (!entry.keepDefault) e.preventDefault();
      entry.run(context, e);
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, [editor, selection, pieces, readOnly, activeOptionId]);

  // Tab inside the plan walks through the pieces; past the last one, focus moves on as usual.
  const onPlanKeyDown = (e: ReactKeyboardEvent) => {
    if (e.key !== 'Tab' || pieces.length === 0) return;
    const index = selection?.kind === 'piece' ? pieces.findIndex((p) => p.id === selection.id) : -1;
    const next = index + (e.shiftKey ? -1 : 1);
    if (next < 0 || next >= pieces.length) {
      setSelection(null);
      return;
    }
    e.preventDefault();
    setSelection({ kind: 'piece', id: pieces[next].id });
  };

  const chooseStep = (s: EditorStep) => {
    setStep(s);
    setChosenFinding(null);
    setDrawing(false);
    setPreview(null);
  };

  const panel = useMemo(() => {
    if (!option) return null;
    switch (step) {
      case 'outline':
        return (
          <OutlinePanel
            shell={editor.doc.shell}
            run={editor.run}
            commit={commitField}
            unit={unit}
            readOnly={shellReadOnly}
            selection={selection}
            onSelect={setSelection}
            onPreview={setPreview}
            onDraw={() => setDrawing(true)}
          />
        );
      case 'openings':
        return (
          <OpeningsPanel
            shell={editor.doc.shell}
            run={editor.run}
            commit={commitField}
            unit={unit}
            readOnly={shellReadOnly}
            selection={selection}
            onSelect={setSelection}
            newId={newId}
          />
        );
      case 'furnish':
        return (
          <FurnishPanel
            shell={editor.doc.shell}
            optionId={activeOptionId}
            pieces={pieces}
            run={editor.run}
            commit={commitField}
            unit={unit}
            readOnly={optionReadOnly}
            selection={selection}
            onSelect={setSelection}
            newId={newId}
            viewCentre={viewCentre}
            models={models}
          />
        );
      case 'finishes':
        return (
          <FinishesPanel
            doc={option}
            optionId={activeOptionId}
            finishes={finishes}
            run={editor.run}
            readOnly={optionReadOnly}
            selection={selection}
            onSelect={select}
            surface={finishTarget}
            onSurface={setFinishTarget}
          />
        );
      case 'check':
        return (
          <CheckPanel
            shell={editor.doc.shell}
            pieces={pieces}
            result={fit}
            walkwayMm={walkwayMm}
            onWalkway={setWalkwayMm}
            unit={unit}
            selected={chosenFinding}
            onChoose={setChosenFinding}
            marks={seenMarks.marks}
            onMark={seenMarks.onMark}
            onUnmark={seenMarks.onUnmark}
            readOnly={optionReadOnly}
            modelBudget={modelBudget}
          />
        );
    }
  }, [
    step,
    editor.doc.shell,
    editor.run,
    commitField,
    unit,
    shellReadOnly,
    optionReadOnly,
    selection,
    option,
    activeOptionId,
    pieces,
    newId,
    viewCentre,
    fit,
    walkwayMm,
    setWalkwayMm,
    chosenFinding,
    seenMarks,
    finishes,
    finishTarget,
    select,
    models,
    modelBudget,
  ]);

  const startSplitDrag = (e: React.PointerEvent) => {
    const host = splitHost.current;
    if (!host) return;
    (e.target as Element).setPointerCapture(e.pointerId);
    const rect = host.getBoundingClientRect();
    const move = (ev: PointerEvent) => setSplit((ev.clientX - rect.left) / rect.width);
    const up = () => {
      window.removeEventListener('pointermove', move);
      window.removeEventListener('pointerup', up);
    };
    window.addEventListener('pointermove', move);
    window.addEventListener('pointerup', up);
  };

  return (
    <div className="flex h-[calc(100vh-4rem)] min-h-[600px] flex-col">
      {/* Top bar: where we are, options, saving */}
      <div className="flex flex-wrap items-center gap-x-4 gap-y-2 border-b border-line bg-paper px-4 py-2">
        <div className="min-w-0">
          <Link to={`/projects/${projectId}`} className="text-xs text-ink-faint hover:text-ink hover:underline">
            Back to the project
          </Link>
          <div className="flex items-center gap-2">
            <h1 className="truncate text-lg font-bold">{editor.roomName}</h1>
            {!readOnly && (
              <button type="button" className="text-xs font-semibold text-pine hover:underline" onClick={() => setRenaming(true)}>
                Rename
              </button>
            )}
          </div>
        </div>
        <OptionsBar
          editor={editor}
          optionId={activeOptionId}
          onChoose={(id) => {
            setOptionId(id);
            setSelection(null);
          }}
          readOnly={readOnly}
          frozen={frozen}
        />
        <div className="ml-auto flex items-center gap-2">
          <span
            role="status"
            data-testid="save-state"
            data-state={editor.saveState}
            className={`text-xs font-medium whitespace-nowrap ${editor.saveState === 'saved' ? 'text-ink-faint' : editor.saveState === 'conflict' || editor.saveState === 'retrying' ? 'text-clay' : 'text-ochre'}`}
          >
            {readOnly
              ? 'Read only'
              : optionFrozen && editor.saveState === 'saved'
                ? 'Chosen option · read only'
                : SAVE_TEXT[editor.saveState]}
          </span>
          {!readOnly && (
            <>
              <Button
                size="sm"
                variant="quiet"
                disabled={!editor.canUndo}
                onClick={editor.undo}
                title={editor.undoLabel ? `Undo: ${editor.undoLabel}` : 'Nothing to undo'}
                aria-label="Undo"
              >
                Undo
              </Button>
              <Button
                size="sm"
                variant="quiet"
                disabled={!editor.canRedo}
                onClick={editor.redo}
                title={editor.redoLabel ? `Redo: ${editor.redoLabel}` : 'Nothing to redo'}
                aria-label="Redo"
              >
                Redo
              </Button>
            </>
          )}
          <label className="sr-only" htmlFor="unit">
            Units
          </label>
          <select
            id="unit"
            className="h-8 rounded-lg border border-line-strong bg-white px-2 text-sm"
            value={unit}
            onChange={(e) => setUnit(e.target.value as LengthUnit)}
          >
            <option value="cm">cm</option>
            <option value="mm">mm</option>
            <option value="m">m</option>
            <option value="ftin">ft in</option>
          </select>
          <Link
            className="text-sm font-semibold whitespace-nowrap text-pine hover:underline"
            to={`/projects/${projectId}/rooms/${detail.room.id}/options/${activeOptionId}/schedule`}
          >
            Schedule
          </Link>
          <a
            className="text-sm font-semibold whitespace-nowrap text-pine hover:underline"
            href={`/api/rooms/${detail.room.id}/plan-file?optionId=${activeOptionId}`}
            download
          >
            Plan file
          </a>
          <Button size="sm" variant="quiet" onClick={() => setHelp(true)} aria-label="Keys">
            Keys
          </Button>
        </div>
      </div>

      {/* Banners */}
      <div className="flex flex-col gap-2 px-4 empty:hidden [&:not(:empty)]:py-2">
        {shellFrozen && (
          <Notice tone="info">
            <div className="flex flex-wrap items-center gap-x-4 gap-y-2" data-testid="decided-banner">
              <p className="min-w-0 flex-1">
                {optionFrozen ? (
                  <>
                    <strong>The project is decided.</strong> The client chose this option, so it is read-only, and so are the
                    room’s walls and openings. To change it, duplicate it, or reopen the project on its page.
                  </>
                ) : (
                  <>
                    <strong>The project is decided.</strong> The client chose {chosenLabels.join(' and ')} here, so the room’s
                    walls and openings are read-only. This option can still change.
                  </>
                )}
              </p>
              {optionFrozen && !readOnly && (
                <Button size="sm" variant="primary" busy={duplicating.busy} onClick={() => void duplicateToChange()}>
                  Duplicate to change
                </Button>
              )}
            </div>
            {duplicating.error && <p className="mt-2 text-clay">{duplicating.error}</p>}
          </Notice>
        )}
        {editor.conflict && (
          <Notice tone="warn">
            <p>
              Someone else saved this {editor.conflict.part === 'room' ? 'room’s walls and openings' : 'option'} while you were
              working. Your changes are still here, not saved.
            </p>
            <div className="mt-2 flex flex-wrap items-center gap-2">
              <Button size="sm" variant="primary" onClick={editor.keepMine}>
                Keep mine on top of theirs
              </Button>
              <Button size="sm" onClick={editor.loadTheirs}>
                Load theirs, drop mine
              </Button>
            </div>
          </Notice>
        )}
        {editor.restored === 'restored' && (
          <Notice tone="info">
            We brought back changes from your last visit that had not been saved yet; they are being saved now.{' '}
            <button type="button" className="font-semibold underline" onClick={editor.dismissRestored}>
              OK
            </button>
          </Notice>
        )}
        {editor.restored === 'stale' && (
          <Notice tone="warn">
            <p>You have unsaved changes from an earlier visit, but the room has changed since.</p>
            <div className="mt-2 flex gap-2">
              <Button size="sm" variant="primary" onClick={() => editor.resolveStaleDraft(true)}>
                Use my changes
              </Button>
              <Button size="sm" onClick={() => editor.resolveStaleDraft(false)}>
                Discard them
              </Button>
            </div>
          </Notice>
        )}
        {editor.refusal && (
          <Notice tone="error">
            {refusalText(editor.refusal, editor.doc.shell, unit)}{' '}
            <button type="button" className="ml-2 font-semibold underline" onClick={editor.clearMessage}>
              Dismiss
            </button>
          </Notice>
        )}
        {editor.message && (
          <Notice tone="error">
            {editor.message}{' '}
            <button type="button" className="ml-2 font-semibold underline" onClick={editor.clearMessage}>
              Dismiss
            </button>
          </Notice>
        )}
        {drawing && (
          <Notice tone="info">
            Click each corner of the room on the plan; click the first corner again to close it. Corners keep to 15° turns unless
            you hold Shift. Esc stops.
          </Notice>
        )}
      </div>

      <div className="flex min-h-0 flex-1 flex-col lg:flex-row">
        {/* Steps */}
        <nav
          aria-label="Steps"
          className="flex shrink-0 gap-1 overflow-x-auto border-b border-line bg-paper p-2 lg:w-40 lg:flex-col lg:border-r lg:border-b-0 lg:p-3"
        >
          {EDITOR_STEPS.map((s, i) => (
            <button
              key={s.id}
              type="button"
              aria-current={step === s.id ? 'step' : undefined}
              onClick={() => chooseStep(s.id)}
              className="rounded-lg px-3 py-2 text-left hover:bg-sand aria-[current=step]:bg-pine-wash"
            >
              <span className="flex items-center text-sm font-bold text-ink">
                <span className="mr-1.5 text-ink-faint">{i + 1}</span>
                {s.label}
                {s.id === 'check' && <FindingsBadge open={seenMarks.open.length} seen={seenMarks.seen.length} />}
              </span>
              <span className="hidden text-xs leading-snug text-ink-soft lg:block">{s.hint}</span>
            </button>
          ))}
        </nav>

        {/* Panel for the step and the selection */}
        <div className="flex min-h-0 flex-1">
          <aside
            aria-label={`${EDITOR_STEPS.find((s) => s.id === step)?.label} step`}
            className="w-72 shrink-0 overflow-y-auto border-r border-line bg-paper p-4 xl:w-80"
          >
            <h2 className="mb-3 text-base font-bold">{EDITOR_STEPS.find((s) => s.id === step)?.label}</h2>
            {panel}
          </aside>

          {/* Plan and 3D preview */}
          <div ref={splitHost} className="relative flex min-w-0 flex-1">
            <div className="absolute top-2 right-2 z-10 flex gap-1 rounded-lg border border-line bg-white/90 p-1 shadow-sm">
              {(['plan', 'both', '3d'] as const).map((l) => (
                <button
                  key={l}
                  type="button"
                  aria-pressed={layout === l}
                  onClick={() => setLayout(l)}
                  className="rounded-md px-2.5 py-1 text-xs font-semibold text-ink-soft aria-pressed:bg-pine aria-pressed:text-white"
                >
                  {l === 'plan' ? 'Plan' : l === 'both' ? 'Both' : '3D'}
                </button>
              ))}
            </div>
            {layout !== '3d' && option && (
              <div
                className="min-w-0 bg-white"
                style={{ flexBasis: layout === 'both' ? `${split * 100}%` : '100%' }}
                tabIndex={0}
                onKeyDown={onPlanKeyDown}
                aria-label="Plan"
                role="group"
              >
                <PlanView
                  shell={editor.doc.shell}
                  optionId={activeOptionId}
                  pieces={pieces}
                  step={step}
                  selection={selection}
                  onSelect={select}
                  run={editor.run}
                  finishGesture={editor.finishGesture}
                  readOnly={step === 'outline' || step === 'openings' ? shellReadOnly : optionReadOnly}
                  unit={unit}
                  newId={newId}
                  drawing={drawing}
                  onDrawingDone={() => setDrawing(false)}
                  preview={preview}
                  highlight={highlight}
                  flaggedPieceIds={flaggedPieceIds}
                  viewCentre={viewCentreRef}
                />
              </div>
            )}
            {layout === 'both' && (
              <div
                role="separator"
                aria-orientation="vertical"
                aria-label="Move the divider between plan and 3D"
                aria-valuenow={Math.round(split * 100)}
                aria-valuemin={SPLIT_MIN * 100}
                aria-valuemax={SPLIT_MAX * 100}
                tabIndex={0}
                onPointerDown={startSplitDrag}
                onKeyDown={(e) => {
                  if (e.key === 'ArrowLeft') nudgeSplit(-SPLIT_KEY_STEP);
                  if (e.key === 'ArrowRight') nudgeSplit(SPLIT_KEY_STEP);
                }}
                className="w-1.5 shrink-0 cursor-col-resize bg-line hover:bg-pine"
              />
            )}
            {layout !== 'plan' && (
              <section aria-label="3D preview" className="relative min-w-0 flex-1 bg-sand">
                <Suspense fallback={<Spinner label="Loading the 3D preview…" />}>
                  {/* A new size of view gets a fresh framing of the room (the view frames itself when it mounts). */}
                  <RoomView
                    key={layout}
                    shell={editor.doc.shell}
                    pieces={pieces}
                    selectedPieceId={selection?.kind === 'piece' ? selection.id : null}
                    onPieceClick={(id) => select({ kind: 'piece', id })}
                    finishes={sceneFinishes}
                    models={sceneModels}
                    onSurfaceClick={
                      step === 'finishes'
                        ? (hit) => {
                            if (hit === 'floor' || hit === 'ceiling') {
                              setSelection(null);
                              setFinishTarget(hit);
                            } else select({ kind: 'wall', index: hit.wall });
                          }
                        : undefined
                    }
                    className="absolute inset-0"
                    label={`${editor.roomName} in 3D`}
                  />
                </Suspense>
              </section>
            )}
          </div>
        </div>
      </div>

      {help && <KeysHelp onClose={() => setHelp(false)} />}
      {renaming && <RenameRoom name={editor.roomName} onClose={() => setRenaming(false)} onSave={editor.renameRoom} />}
    </div>
  );
}

function KeysHelp({ onClose }: { onClose: () => void }) {
  return (
    <Dialog
      open
      onClose={onClose}
      title="Keys in the room editor"
      footer={
        <Button variant="primary" onClick={onClose}>
          Close
        </Button>
      }
    >
      <table className="w-full text-sm">
        <tbody>
          {EDITOR_KEYS.map(({ keys, label }) => (
            <tr key={keys} className="border-b border-line last:border-0">
              <th scope="row" className="py-2 pr-4 text-left font-semibold whitespace-nowrap">
                <kbd className="rounded bg-sand px-1.5 py-0.5 font-sans">{keys}</kbd>
              </th>
              <td className="py-2 text-ink-soft">{label}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </Dialog>
  );
}

function RenameRoom({ name, onClose, onSave }: { name: string; onClose: () => void; onSave: (name: string) => Promise<void> }) {
  const [value, setValue] = useState(name);
  return (
    <FormDialog title="Rename room" onClose={onClose} onSave={() => onSave(value.trim())}>
      <label className="flex flex-col gap-1.5 text-sm font-semibold">
        Room name
        <input
          className="h-10 rounded-lg border border-line-strong bg-white px-3 text-[15px] font-normal"
          value={value}
          onChange={(e) => setValue(e.target.value)}
          autoFocus
        />
      </label>
    </FormDialog>
  );
}
