// The client's walk-through of one room in 3D: the Overview and Walk, every option built once and
// switched instantly, keys and on-screen buttons, and soft floor shadows baked per option.
import { useCallback, useEffect, useImperativeHandle, useMemo, useRef, useState, type KeyboardEvent } from 'react';
import * as THREE from 'three';
import { buildPiecesScene, type PieceSceneData } from '../../../../shared/geometry/scene';
import { walkObstacles, type WalkObstacles } from '../../../../shared/geometry/walk';
import type { Piece } from '../../../../shared/schemas/option';
import type { RoomShell } from '../../../../shared/schemas/room';
import type { CameraLink, ViewMode, ViewPose } from './camera-link';
import type { SurfaceFinishes, TextureProgress } from '../../../scene/finish-materials';
import { RenderAndReport } from '../../../scene/render-report';
import { RoomPieces, type PieceBuild } from '../../../scene/room-pieces';
import { modelSources, type ModelSource } from '../../../scene/piece-models';
import { buildPieceForms, type PieceFormData } from '../../../../shared/geometry/forms/piece-forms';
import { RoomShellMeshes } from '../../../scene/room-shell';
import { SceneCanvas } from '../../../scene/scene-canvas';
import { SceneLights } from '../../../scene/scene-lights';
import { dressedPieces, surfaceMaterials, tryBuild, useStableValue, useWallFade } from '../../../scene/view-helpers';
import { HeldMoves, type RigHandle, type WalkMove } from './rig-shared';
import { OverviewRig } from './overview-rig';
import { WalkRig } from './walk-rig';
import { useSceneResources } from '../../../scene/use-scene-resources';
import { contactShadows, daylightDirection, noShadows } from './contact-shadows';

export type { WalkMove } from './rig-shared';
export type { ViewMode } from './camera-link';
export type { TextureProgress } from '../../../scene/finish-materials';

/** One option of the room: its pieces and what its surfaces wear. */
export interface WalkthroughOption {
  id: string;
  /** Pieces; one wearing a ready model carries it (the client's payload names it). */
  pieces: (Piece & { model?: ModelSource })[];
  finishes: SurfaceFinishes;
}

/** What the on-screen buttons can ask of a view. */
export interface ViewCommands {
  /** Overview: the room a step round (−1 left, +1 right); Walk: a step's turn. */
  turn(direction: -1 | 1): void;
  /** Overview: closer (−1) or further (+1). */
  zoom(direction: -1 | 1): void;
  topView(): void;
  /** Overview: the first view of the room; Walk: back to the door. */
  reset(): void;
  /** Walk: a move held down (a pressed button) or let go. */
  hold(move: WalkMove, held: boolean): void;
  /** Walk: one short move (a button pressed from the keyboard). */
  step(move: WalkMove): void;
}

export interface WalkthroughViewProps {
  shell: RoomShell;
  /** Every option of the room; each is built once and kept, so switching is instant. */
  options: WalkthroughOption[];
  /** The option on show. */
  optionId: string;
  mode: ViewMode;
  /** Eye height above the floor in Walk, mm. */
  eyeHeightMm: number;
  /** No animated camera moves: buttons and clicks jump straight to where they lead. */
  reducedMotion: boolean;
  selectedPieceId?: string | null;
  onPieceClick?: (id: string) => void;
  /** Views sharing a link move together (Compare); the link also remembers the last pose. */
  link?: CameraLink;
  /** This view's name on the link. */
  viewId?: string;
  commandsRef?: React.Ref<ViewCommands>;
  onTextureProgress?: (progress: TextureProgress) => void;
  /** Draw the pieces as their forms (the default) or as their plain boxes, for comparison. */
  pieceBuild?: PieceBuild;
  label: string;
  className?: string;
}

const WEBGL_MESSAGE = 'The 3D view needs WebGL, which this browser has turned off.';
/** Said briefly over Walk when a clicked spot of floor cannot be reached on foot. */
export const NO_WAY_MESSAGE = 'You can’t walk there';
/** How long the message stays (ms): long enough to read, short enough not to linger. */
const NO_WAY_MS = 2500;

/** A short message shown for a moment; `say` shows it again (and restarts its time). */
function useBriefNotice(ms: number): [string | null, (text: string) => void] {
  const [notice, setNotice] = useState<{ text: string; at: number } | null>(null);
  useEffect(() => {
    if (!notice) return undefined;
    const timer = window.setTimeout(() => setNotice(null), ms);
    return () => window.clearTimeout(timer);
  }, [notice, ms]);
  const say = useCallback((text: string) => setNotice({ text, at: performance.now() }), []);
  return [notice?.text ?? null, say];
}

// Keys while the view has focus. The arrows walk forward and back and turn; the letter keys walk
// and step sideways. In the Overview the same keys turn the room and come closer.
const KEY_MOVES: Record<string, WalkMove> = {
  KeyW: 'forward',
  ArrowUp: 'forward',
  KeyS: 'back',
  ArrowDown: 'back',
  KeyA: 'left',
  KeyD: 'right',
  ArrowLeft: 'turn-left',
  ArrowRight: 'turn-right',
};

/**
 * The client's walk-through of one room: the Overview from above and around it, or Walk at eye
 * level, every option mounted once and shown by `optionId`, daylight through each window and
 * shadows baked once per option. The host carries the renderer figures (data-draw-calls,
 * data-triangles, data-geometries, data-textures, data-texture-bytes, data-frames) and the camera
 * (data-camera "x,y,z", data-look "x,y,z", data-fov, data-mode, data-option, data-moving) for
 * browser tests. A click on floor that cannot be reached says so for a moment (role status).
 */
export default function WalkthroughView(props: WalkthroughViewProps) {
  const { label, className, mode, commandsRef } = props;
  const host = useRef<HTMLDivElement>(null);
  const held = useRef(new HeldMoves());
  const rig = useRef<RigHandle | null>(null);
  const [notice, say] = useBriefNotice(NO_WAY_MS);
  const onNoWay = useCallback(() => say(NO_WAY_MESSAGE), [say]);
  // Set at once when a move starts, cleared by the frame that ends it: tests wait on it.
  const markMoving = useCallback(() => {
    if (host.current) host.current.dataset.moving = 'true';
  }, []);

  useImperativeHandle(
    commandsRef,
    () => ({
      turn: (d) => rig.current?.turn(d),
      zoom: (d) => rig.current?.zoom(d),
      topView: () => rig.current?.topView(),
      reset: () => rig.current?.reset(),
      hold: (move, on) => {
        if (on) held.current.buttons.add(move);
        else held.current.buttons.delete(move);
        markMoving();
        rig.current?.wake();
      },
      step: (move) => rig.current?.step(move),
    }),
    [markMoving],
  );

  // Keys move the camera only while the view has focus, so the page's own keys keep working.
  const onKey = useCallback(
    (e: KeyboardEvent<HTMLDivElement>, down: boolean) => {
      if (e.altKey || e.ctrlKey || e.metaKey) return;
      const move = KEY_MOVES[e.code];
      if (!move) return;
      e.preventDefault();
      if (down) held.current.keys.add(move);
      else held.current.keys.delete(move);
      markMoving();
      rig.current?.wake();
    },
    [markMoving],
  );

  return (
    <SceneCanvas
      host={host}
      label={label}
      webglMessage={WEBGL_MESSAGE}
      // No shadow maps: the soft shadows under the pieces are baked into the floor per option.
      shadowMaps={false}
      aria-roledescription="3D view"
      overlay={
        // Always there, so a screen reader hears the message the moment it is said.
        <p role="status" className="pointer-events-none absolute inset-x-0 top-3 flex justify-center">
          {notice && (
            <span className="rounded-full bg-ink/85 px-4 py-1.5 text-sm font-semibold text-white shadow-sm">{notice}</span>
          )}
        </p>
      }
      data-mode={mode}
      data-option={props.optionId}
      tabIndex={0}
      onKeyDown={(e) => onKey(e, true)}
      onKeyUp={(e) => onKey(e, false)}
      onBlur={() => held.current.keys.clear()}
      className={
        className ?? 'relative h-full w-full outline-none focus-visible:ring-2 focus-visible:ring-pine focus-visible:ring-inset'
      }
    >
      <WalkthroughScene {...props} host={host} held={held} rig={rig} onMoveStart={markMoving} onNoWay={onNoWay} />
    </SceneCanvas>
  );
}

interface SceneProps extends WalkthroughViewProps {
  host: React.RefObject<HTMLDivElement | null>;
  held: React.RefObject<HeldMoves>;
  rig: React.RefObject<RigHandle | null>;
  onMoveStart: () => void;
  onNoWay: () => void;
}

interface BuiltOption {
  id: string;
  pieces: Piece[];
  pieceScene: readonly PieceSceneData[];
  forms: readonly PieceFormData[] | null;
  obstacles: WalkObstacles;
  finishes: SurfaceFinishes;
  models: ReadonlyMap<string, ModelSource>;
}

function WalkthroughScene(props: SceneProps) {
  const {
    optionId,
    mode,
    eyeHeightMm,
    reducedMotion,
    selectedPieceId = null,
    onPieceClick,
    link,
    viewId = 'main',
    host,
    held,
    rig,
    onTextureProgress,
    onMoveStart,
    onNoWay,
    pieceBuild = 'forms',
  } = props;
  const shell = useStableValue(props.shell);
  const options = useStableValue(props.options);
  const { invalidate, materials, finishMaterials, parts, windows } = useSceneResources(shell, onTextureProgress);

  // Every option is built once, up front: switching only changes which group is visible.
  const built = useMemo<BuiltOption[]>(
    () =>
      options.map((o) => {
        const pieces = dressedPieces(o.pieces, o.finishes);
        return {
          id: o.id,
          pieces,
          finishes: o.finishes,
          pieceScene: tryBuild('pieces', () => buildPiecesScene(pieces)) ?? [],
          forms: pieceBuild === 'forms' ? tryBuild('forms', () => buildPieceForms(pieces)) : null,
          obstacles: tryBuild('walk', () => walkObstacles(shell, pieces)) ?? { segments: [], boxes: [], outline: shell.outline },
          models: pieceBuild === 'forms' ? modelSources(o.pieces) : new Map(),
        };
      }),
    [options, shell, pieceBuild],
  );
  // Every option's finishes are asked for at once, so their textures load while the first is shown.
  const surfacesByOption = useMemo(
    () => new Map(built.map((o) => [o.id, surfaceMaterials(o.finishes, finishMaterials)])),
    [built, finishMaterials],
  );
  const active = built.find((o) => o.id === optionId) ?? built[0];
  const surfaces = active ? surfacesByOption.get(active.id) : undefined;

  const { walls, ceiling, lastCamera, updateView } = useWallFade(
    parts,
    mode === 'overview',
    materials,
    host,
    invalidate,
    surfaces,
  );

  const shadowMaterial = useMemo(
    () =>
      new THREE.MeshBasicMaterial({
        color: '#000000',
        vertexColors: true,
        transparent: true,
        depthWrite: false,
        polygonOffset: true,
        polygonOffsetFactor: -1,
        polygonOffsetUnits: -1,
      }),
    [],
  );
  useEffect(() => () => shadowMaterial.dispose(), [shadowMaterial]);
  const daylight = useMemo(() => daylightDirection(windows), [windows]);

  // Poses remembered across mode changes, so going back to the Overview finds it as it was left.
  const overviewPose = useRef<ViewPose | null>(null);
  const walkPoseRef = useRef<ViewPose | null>(null);
  const onFloorPoint = useCallback((x: number, z: number) => rig.current?.walkTo(x, z), [rig]);

  const textureBytes = useCallback(() => {
    const camera = lastCamera.current;
    const figures = (v: THREE.Vector3, digits: number) =>
      v
        .toArray()
        .map((n) => n.toFixed(digits))
        .join(',');
    return {
      textureBytes: String(finishMaterials.textureBytes()),
      camera: camera ? figures(camera.position, 3) : '',
      // Which way the camera looks (a unit vector): with the camera and the field of view, tests
      // find where a point of the room is on screen.
      look: camera ? figures(camera.getWorldDirection(lookScratch), 4) : '',
      fov: camera instanceof THREE.PerspectiveCamera ? String(camera.fov) : '',
      moving: String(rig.current?.busy() ?? false),
    };
  }, [finishMaterials, lastCamera, rig]);

  if (!parts || !active) return <RenderAndReport host={host} extra={textureBytes} />;
  return (
    <>
      <SceneLights bounds={parts.bounds} windows={windows} sunShadows={false} />
      <RoomShellMeshes
        parts={parts}
        materials={materials}
        wallsRef={walls}
        ceilingRef={ceiling}
        surfaces={surfaces}
        onFloorPoint={mode === 'walk' ? onFloorPoint : undefined}
      />
      {built.map((o) => (
        <group key={o.id} visible={o.id === active.id}>
          <FloorShadows pieces={o.pieces} daylight={daylight} material={shadowMaterial} />
          <RoomPieces
            pieceScene={o.pieceScene}
            pieces={o.pieces}
            selectedPieceId={o.id === active.id ? selectedPieceId : null}
            materials={materials}
            forms={o.forms ? { data: o.forms, finishes: o.finishes, finishMaterials } : undefined}
            models={o.models}
            // Hidden options must not catch clicks: the pointer passes through invisible meshes.
            onPieceClick={o.id === active.id ? onPieceClick : undefined}
          />
        </group>
      ))}
      {mode === 'overview' ? (
        <OverviewRig
          bounds={parts.bounds}
          onView={updateView}
          link={link}
          viewId={viewId}
          memory={overviewPose}
          reducedMotion={reducedMotion}
          held={held}
          rig={rig}
          onMoveStart={onMoveStart}
        />
      ) : (
        <WalkRig
          shell={shell}
          obstacles={active.obstacles}
          eyeM={eyeHeightMm / 1000}
          onView={updateView}
          link={link}
          viewId={viewId}
          memory={walkPoseRef}
          reducedMotion={reducedMotion}
          held={held}
          rig={rig}
          onMoveStart={onMoveStart}
          onNoWay={onNoWay}
        />
      )}
      <RenderAndReport host={host} extra={textureBytes} />
    </>
  );
}

const lookScratch = new THREE.Vector3();

/** One option's soft floor shadows: built once, kept while the option is, disposed with it. */
function FloorShadows({
  pieces,
  daylight,
  material,
}: {
  pieces: readonly Piece[];
  daylight: [number, number];
  material: THREE.Material;
}) {
  const [dx, dz] = daylight;
  const geometry = useMemo(() => {
    const data = contactShadows(pieces, [dx, dz]);
    if (noShadows(data)) return null;
    const g = new THREE.BufferGeometry();
    g.setAttribute('position', new THREE.BufferAttribute(data.positions, 3));
    g.setAttribute('color', new THREE.BufferAttribute(data.colours, 4));
    g.setIndex(new THREE.BufferAttribute(data.indices, 1));
    g.computeBoundingSphere();
    return g;
  }, [pieces, dx, dz]);
  useEffect(() => () => geometry?.dispose(), [geometry]);
  return geometry ? <mesh geometry={geometry} material={material} renderOrder={1} /> : null;
}
