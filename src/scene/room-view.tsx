import { Canvas, useFrame, useThree } from '@react-three/fiber';
import { useCallback, useEffect, useLayoutEffect, useMemo, useRef, useState } from 'react';
import * as THREE from 'three';
import { buildRoomScene, type PieceSceneData } from '../../shared/geometry/scene';
import type { Piece } from '../../shared/schemas/option';
import type { RoomShell } from '../../shared/schemas/room';
import { createSceneMaterials, disposeSceneMaterials, SCENE_BACKGROUND, type SceneMaterials } from './materials';
import { OverviewControls } from './overview-controls';
import { RoomPieces } from './room-pieces';
import { RoomShellMeshes, type SurfaceHit } from './room-shell';
import { browserHasWebGL, SceneErrorBoundary } from './scene-error-boundary';
import { SceneLights } from './scene-lights';
import { shellParts, type ShellParts } from './shell-parts';
import { applyWallFade } from './wall-fade';
import { FinishMaterials, finishColourHex, type SurfaceFinishes } from './finish-materials';
import { wallsFacingEye } from './wall-facing';

export type { SurfaceHit } from './room-shell';
export type { SurfaceFinishes } from './finish-materials';

export interface RoomViewProps {
  shell: RoomShell;
  /** Only placed pieces are drawn. */
  pieces: Piece[];
  /** Drawn tinted and outlined in the accent. */
  selectedPieceId?: string | null;
  onPieceClick?: (id: string) => void;
  /** Default true: walls between the eye and the room centre fade so the room reads like a model. */
  fadeNearWalls?: boolean;
  /** Sizes the view; without one it fills its parent. */
  className?: string;
  /** Accessible name of the view's region. */
  label?: string;
  /** What the option's surfaces and pieces wear. */
  finishes?: SurfaceFinishes;
  /** A click on the floor, the ceiling or a wall's inside face (the editor's Finishes step). */
  onSurfaceClick?: (surface: SurfaceHit) => void;
}

const FIELD_OF_VIEW_DEG = 40;
const WEBGL_MESSAGE = '3D preview needs WebGL.';

/**
 * The room in 3D (Overview): floor, walls with their openings, door leaves, windows and placed
 * pieces, lit softly and drawn only when something changes. The host element carries
 * `data-draw-calls`, `data-triangles`, `data-geometries` (live on the GPU), `data-frames` and
 * `data-faded-walls` after each frame so browser tests can read what was drawn.
 */
export default function RoomView({
  shell,
  pieces,
  selectedPieceId = null,
  onPieceClick,
  fadeNearWalls = true,
  className,
  label = 'Room in 3D',
  finishes,
  onSurfaceClick,
}: RoomViewProps) {
  const host = useRef<HTMLDivElement>(null);
  const [webgl] = useState(browserHasWebGL);
  const fallback = <WebGLMessage />;
  return (
    <div ref={host} role="region" aria-label={label} data-testid="room-view" className={className ?? 'relative h-full w-full'}>
      {webgl ? (
        <SceneErrorBoundary fallback={fallback}>
          <Canvas
            frameloop="demand"
            shadows="percentage"
            dpr={[1, 2]}
            // Neutral tone mapping keeps a lit paint close to its swatch; the output is sRGB.
            gl={{ preserveDrawingBuffer: true, antialias: true, toneMapping: THREE.NeutralToneMapping, outputColorSpace: THREE.SRGBColorSpace }}
            camera={{ fov: FIELD_OF_VIEW_DEG, near: 0.05, far: 200, position: [0, 8, 8] }}
            fallback={fallback}
          >
            <color attach="background" args={[SCENE_BACKGROUND]} />
            <RoomScene
              shell={shell}
              pieces={pieces}
              selectedPieceId={selectedPieceId}
              onPieceClick={onPieceClick}
              fadeNearWalls={fadeNearWalls}
              host={host}
              finishes={finishes}
              onSurfaceClick={onSurfaceClick}
            />
          </Canvas>
        </SceneErrorBoundary>
      ) : (
        fallback
      )}
    </div>
  );
}

function WebGLMessage() {
  return (
    <div className="flex h-full w-full items-center justify-center bg-sand p-4 text-sm text-ink-soft">
      <p>{WEBGL_MESSAGE}</p>
    </div>
  );
}

/** The same value while its JSON stays the same, so memos key on content, not on object identity. */
function useStableValue<T>(value: T): T {
  const key = JSON.stringify(value);
  return useMemo(() => JSON.parse(key) as T, [key]);
}

// A shell mid-edit can break a rule the geometry relies on; the view then draws nothing for it
// rather than taking the page down, and the editor's checks say what is wrong.
function tryBuild<T>(what: string, build: () => T): T | null {
  try {
    return build();
  } catch (error) {
    console.warn(`3D view could not build the ${what}:`, error);
    return null;
  }
}

interface RoomSceneProps {
  shell: RoomShell;
  pieces: Piece[];
  selectedPieceId: string | null;
  onPieceClick?: (id: string) => void;
  fadeNearWalls: boolean;
  host: React.RefObject<HTMLDivElement | null>;
  finishes?: SurfaceFinishes;
  onSurfaceClick?: (surface: SurfaceHit) => void;
}

function RoomScene({ shell: shellProp, pieces: piecesProp, selectedPieceId, onPieceClick, fadeNearWalls, host, finishes: finishesProp, onSurfaceClick }: RoomSceneProps) {
  const shell = useStableValue(shellProp);
  const finishes = useStableValue(finishesProp ?? {});
  const invalidate = useThree((state) => state.invalidate);
  // Pieces wearing a finish are drawn in its colour (a photo's mean colour: pieces share one mesh).
  const pieces = useStableValue(
    piecesProp.filter((p) => p.placed).map((p) => (finishes.pieces?.[p.id] ? { ...p, colour: finishColourHex(finishes.pieces[p.id]) } : p)),
  );

  const materials = useMemo(createSceneMaterials, []);
  useEffect(() => () => disposeSceneMaterials(materials), [materials]);
  const gl = useThree((state) => state.gl);
  const finishMaterials = useMemo(() => new FinishMaterials(() => invalidate(), Math.min(8, gl.capabilities.getMaxAnisotropy())), [invalidate, gl]);
  useEffect(() => () => finishMaterials.dispose(), [finishMaterials]);
  const surfaces = useMemo(() => ({
    floor: finishes.floor ? finishMaterials.get(finishes.floor) : undefined,
    ceiling: finishes.ceiling ? finishMaterials.get(finishes.ceiling) : undefined,
    inside: (wall: number) => {
      const f = finishes.wallOverrides?.[String(wall)] ?? finishes.walls ?? null;
      return f ? finishMaterials.get(f) : undefined;
    },
  }), [finishes, finishMaterials]);

  const parts = useMemo(() => tryBuild('room', () => shellParts(buildRoomScene(shell, { pieces: [] }), shell)), [shell]);
  const pieceScene = useMemo<readonly PieceSceneData[]>(
    () => tryBuild('pieces', () => buildRoomScene(shell, { pieces }).pieces) ?? [],
    [shell, pieces],
  );

  const walls = useRef<THREE.Group>(null);
  const ceiling = useRef<THREE.Mesh>(null);
  const lastCamera = useRef<THREE.Camera | null>(null);

  // Runs on every camera move: mutates meshes and one data attribute, never React state.
  const updateView = useCallback(
    (camera: THREE.Camera) => {
      lastCamera.current = camera;
      if (!parts) return;
      updateWallFade(parts, camera, fadeNearWalls, walls.current, ceiling.current, materials, host.current);
    },
    [parts, fadeNearWalls, materials, host],
  );

  // New wall meshes mount solid, and the fade setting can change without the camera moving.
  useLayoutEffect(() => {
    if (lastCamera.current) updateView(lastCamera.current);
    invalidate();
  }, [updateView, invalidate, surfaces]);

  if (!parts) return <RenderAndReport host={host} />;
  return (
    <>
      <SceneLights bounds={parts.bounds} />
      <RoomShellMeshes parts={parts} materials={materials} wallsRef={walls} ceilingRef={ceiling} surfaces={surfaces} onSurfaceClick={onSurfaceClick} />
      <RoomPieces pieceScene={pieceScene} pieces={pieces} selectedPieceId={selectedPieceId} materials={materials} onPieceClick={onPieceClick} />
      <OverviewControls bounds={parts.bounds} onView={updateView} />
      <RenderAndReport host={host} />
    </>
  );
}

function updateWallFade(
  parts: ShellParts,
  camera: THREE.Camera,
  fadeNearWalls: boolean,
  walls: THREE.Group | null,
  ceiling: THREE.Mesh | null,
  materials: SceneMaterials,
  host: HTMLElement | null,
): void {
  const { min, max } = parts.bounds;
  const centre: [number, number, number] = [(min[0] + max[0]) / 2, (min[1] + max[1]) / 2, (min[2] + max[2]) / 2];
  const eye: [number, number, number] = [camera.position.x, camera.position.y, camera.position.z];
  const faded = fadeNearWalls ? wallsFacingEye(parts.walls, eye, centre) : [];
  if (walls) applyWallFade(walls, new Set(faded), materials);
  // Seen from above the ceiling faces away and only costs a draw call; from below it closes the room.
  if (ceiling) ceiling.visible = eye[1] < max[1];
  if (host) host.dataset.fadedWalls = faded.join(',');
}

// Takes over drawing (a frame callback with priority above zero) so renderer.info can be read
// right after the frame it describes, and publishes it on the host for browser tests.
function RenderAndReport({ host }: { host: React.RefObject<HTMLDivElement | null> }) {
  const frames = useRef(0);
  useFrame(({ gl, scene, camera }) => {
    gl.render(scene, camera);
    frames.current += 1;
    const element = host.current;
    if (!element) return;
    element.dataset.drawCalls = String(gl.info.render.calls);
    element.dataset.triangles = String(gl.info.render.triangles);
    element.dataset.geometries = String(gl.info.memory.geometries);
    element.dataset.textures = String(gl.info.memory.textures);
    element.dataset.frames = String(frames.current);
  }, 1);
  return null;
}
