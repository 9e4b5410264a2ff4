// The editor's 3D preview of a room: the shell, the placed pieces and their finishes, with the
// Overview's orbit controls, clickable pieces and surfaces, and the near walls faded.
import { useMemo, useRef } from 'react';
import { buildPiecesScene, type PieceSceneData } from '../../shared/geometry/scene';
import type { Piece } from '../../shared/schemas/option';
import type { RoomShell } from '../../shared/schemas/room';
import { OverviewControls } from './overview-controls';
import { RoomPieces } from './room-pieces';
import { buildPieceForms } from '../../shared/geometry/forms/piece-forms';
import { RoomShellMeshes, type SurfaceHit } from './room-shell';
import { SceneCanvas } from './scene-canvas';
import { SceneLights } from './scene-lights';
import { RenderAndReport } from './render-report';
import type { SurfaceFinishes } from './finish-materials';
import { useSceneResources } from './use-scene-resources';
import { dressedPieces, surfaceMaterials, tryBuild, useStableValue, useWallFade } from './view-helpers';

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
  return (
    <SceneCanvas
      host={host}
      label={label}
      webglMessage={WEBGL_MESSAGE}
      shadowMaps
      className={className ?? 'relative h-full w-full'}
    >
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
    </SceneCanvas>
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
  const pieces = useStableValue(dressedPieces(piecesProp, finishes));

  const { invalidate, materials, finishMaterials, parts, windows } = useSceneResources(shell);
  const surfaces = useMemo(() => surfaceMaterials(finishes, finishMaterials), [finishes, finishMaterials]);

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
