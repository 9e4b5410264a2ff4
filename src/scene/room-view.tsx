import { Canvas, useThree } from '@react-three/fiber';
import { useEffect, useMemo, useRef, useState } from 'react';
import * as THREE from 'three';
import { buildPiecesScene, buildShellScene, type PieceSceneData } from '../../shared/geometry/scene';
import type { Piece } from '../../shared/schemas/option';
import type { RoomShell } from '../../shared/schemas/room';
import { createSceneMaterials, disposeSceneMaterials, SCENE_BACKGROUND } from './materials';
import { OverviewControls } from './overview-controls';
import { RoomPieces } from './room-pieces';
import { buildPieceForms } from '../../shared/geometry/forms/piece-forms';
import { RoomShellMeshes, type SurfaceHit } from './room-shell';
import { browserHasWebGL, SceneErrorBoundary } from './scene-error-boundary';
import { SceneLights } from './scene-lights';
import { shellParts } from './shell-parts';
import { RenderAndReport } from './render-report';
import { FinishMaterials, type SurfaceFinishes } from './finish-materials';
import { dressedPieces, surfaceMaterials, tryBuild, useStableValue, useWallFade } from './view-helpers';
import { windowLightRects } from './window-lights';

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
            gl={{
              preserveDrawingBuffer: true,
              antialias: true,
              toneMapping: THREE.NeutralToneMapping,
              outputColorSpace: THREE.SRGBColorSpace,
            }}
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

function RoomScene({
  shell: shellProp,
  pieces: piecesProp,
  selectedPieceId,
  onPieceClick,
  fadeNearWalls,
  host,
  finishes: finishesProp,
  onSurfaceClick,
}: RoomSceneProps) {
  const shell = useStableValue(shellProp);
  const finishes = useStableValue(finishesProp ?? {});
  const invalidate = useThree((state) => state.invalidate);
  const pieces = useStableValue(dressedPieces(piecesProp, finishes));

  const materials = useMemo(createSceneMaterials, []);
  useEffect(() => () => disposeSceneMaterials(materials), [materials]);
  const gl = useThree((state) => state.gl);
  const finishMaterials = useMemo(
    () => new FinishMaterials(() => invalidate(), Math.min(8, gl.capabilities.getMaxAnisotropy())),
    [invalidate, gl],
  );
  useEffect(() => () => finishMaterials.dispose(), [finishMaterials]);
  const surfaces = useMemo(() => surfaceMaterials(finishes, finishMaterials), [finishes, finishMaterials]);
  const windows = useMemo(() => tryBuild('windows', () => windowLightRects(shell)) ?? [], [shell]);

  const parts = useMemo(() => tryBuild('room', () => shellParts(buildShellScene(shell), shell)), [shell]);
  const pieceScene = useMemo<readonly PieceSceneData[]>(() => tryBuild('pieces', () => buildPiecesScene(pieces)) ?? [], [pieces]);
  const forms = useMemo(() => tryBuild('forms', () => buildPieceForms(pieces)), [pieces]);

  const { walls, ceiling, updateView } = useWallFade(parts, fadeNearWalls, materials, host, invalidate, surfaces);

  if (!parts) return <RenderAndReport host={host} />;
  return (
    <>
      <SceneLights bounds={parts.bounds} windows={windows} />
      <RoomShellMeshes
        parts={parts}
        materials={materials}
        wallsRef={walls}
        ceilingRef={ceiling}
        surfaces={surfaces}
        onSurfaceClick={onSurfaceClick}
      />
      <RoomPieces
        pieceScene={pieceScene}
        pieces={pieces}
        selectedPieceId={selectedPieceId}
        materials={materials}
        onPieceClick={onPieceClick}
        forms={forms ? { data: forms, finishes, finishMaterials } : undefined}
      />
      <OverviewControls bounds={parts.bounds} onView={updateView} />
      <RenderAndReport host={host} />
    </>
  );
}
