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
import type { ModelSource } from './piece-models';
import { useSceneResources } from './use-scene-resources';
import { dressedPieces, surfaceMaterials, tryBuild, useStableValue, useWallFade } from './view-helpers';

export type { SurfaceHit } from './room-shell';
export type { SurfaceFinishes } from './finish-materials';
export type { ModelSource } from './piece-models';

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
  /** Pieces that wear a ready model, by piece id: drawn as the model once it has arrived, as the form until then or if it fails. */
  models?: ReadonlyMap<string, ModelSource>;
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
  models,
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
        models={models}
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
  models?: ReadonlyMap<string, ModelSource>;
}

/** No models: one map, so a view without them keeps the same props from render to render. */
const NO_MODELS: ReadonlyMap<string, ModelSource> = new Map();

function RoomScene({
  shell: shellProp,
  pieces: piecesProp,
  selectedPieceId,
  onPieceClick,
  fadeNearWalls,
  host,
  finishes: finishesProp,
  onSurfaceClick,
  models: modelsProp,
}: RoomSceneProps) {
  const shell = useStableValue(shellProp);
  const finishes = useStableValue(finishesProp ?? {});
  const pieces = useStableValue(dressedPieces(piecesProp, finishes));
  // The editor hands a new map on every change of the option: kept while its content is the same,
  // so the forms are not regrouped for nothing.
  const modelEntries = useStableValue(modelsProp ? [...modelsProp] : []);
  const models = useMemo(() => (modelEntries.length > 0 ? new Map(modelEntries) : NO_MODELS), [modelEntries]);

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
        // Models stand in for forms; drawn as plain boxes (a form failed to build) the pieces stay boxes.
        models={forms ? models : undefined}
      />
      <OverviewControls bounds={parts.bounds} onView={updateView} />
      <RenderAndReport host={host} />
    </>
  );
}
