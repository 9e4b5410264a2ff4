// The room's pieces in 3D: drawn as their forms or as plain boxes, merged into a few meshes coloured
// per vertex, with clicks traced back to a piece and the selected piece highlighted (its form tinted
// and outlined).
import type { ThreeEvent } from '@react-three/fiber';
import { useThree } from '@react-three/fiber';
import { useEffect, useLayoutEffect, useMemo } from 'react';
import * as THREE from 'three';
import type { PieceFormData } from '../../shared/geometry/forms/piece-forms';
import type { PieceSceneData } from '../../shared/geometry/scene';
import { isWalkedOver } from '../../shared/geometry/piece';
import type { Piece } from '../../shared/schemas/option';
import { mergeMeshData, mergedRanges, meshDataToGeometry, partOfTriangle, type MergedRanges } from './build-geometry';
import type { FinishMaterials, SurfaceFinishes } from './finish-materials';
import { formGroups, groupVertexColours, type FormGroup } from './form-groups';
import { FLAT_PIECE_LIFT_M, type SceneMaterials } from './materials';
import { pieceVertexColours } from './piece-colours';
import { PieceModels, useLoadedModels, type ModelSource } from './piece-models';

/** A press that moves further than this (CSS pixels) was an orbit, not a click on a piece. */
export const CLICK_SLOP_PX = 5;
/** Only corners sharper than this (degrees) get a selection edge: a box's twelve edges, a form's creases, not its curves. */
const EDGE_ANGLE_DEG = 30;

/** How pieces are drawn: as their forms, or as the plain boxes the checks measure (kept to compare against). */
export type PieceBuild = 'forms' | 'boxes';

/** The pieces' forms and what they wear; without it the pieces are drawn as their plain boxes. */
export interface PieceFormsInput {
  data: readonly PieceFormData[];
  finishes: SurfaceFinishes;
  finishMaterials: FinishMaterials;
}

interface RoomPiecesProps {
  pieceScene: readonly PieceSceneData[];
  pieces: readonly Piece[];
  selectedPieceId: string | null;
  materials: SceneMaterials;
  onPieceClick?: (id: string) => void;
  forms?: PieceFormsInput;
  /** Pieces that wear a model, by piece id: drawn as the model once it has arrived, as the form until then. */
  models?: ReadonlyMap<string, ModelSource>;
}

type ClickHandlers = ReturnType<typeof useClickHandlers>;

function useClickHandlers(
  onPieceClick: ((id: string) => void) | undefined,
  pieceOfTriangle: (triangle: number) => string | null,
) {
  return useMemo(() => {
    if (!onPieceClick) return {};
    const setCursor = (event: ThreeEvent<PointerEvent>, cursor: string) => {
      const canvas = event.nativeEvent.target;
      if (canvas instanceof HTMLElement) canvas.style.cursor = cursor;
    };
    return {
      onClick: (event: ThreeEvent<MouseEvent>) => {
        event.stopPropagation();
        if (event.delta > CLICK_SLOP_PX || event.faceIndex == null) return;
        const id = pieceOfTriangle(event.faceIndex);
        if (id) onPieceClick(id);
      },
      onPointerOver: (event: ThreeEvent<PointerEvent>) => setCursor(event, 'pointer'),
      onPointerOut: (event: ThreeEvent<PointerEvent>) => setCursor(event, ''),
    };
  }, [onPieceClick, pieceOfTriangle]);
}

/**
 * The selected piece highlighted while its details are open: its form (or its box, drawn as boxes)
 * drawn again on its own in the accent, see-through over the piece, with an outline of its edges.
 * Only that piece is built, on selection; the room's merged meshes are left as they are.
 */
function SelectionHighlight({
  pieceScene,
  pieces,
  forms,
  selectedPieceId,
  materials,
}: Pick<RoomPiecesProps, 'pieceScene' | 'pieces' | 'forms' | 'selectedPieceId' | 'materials'>) {
  const built = useMemo(() => {
    if (!selectedPieceId) return null;
    const form = forms?.data.find((f) => f.id === selectedPieceId);
    const box = pieceScene.find((p) => p.id === selectedPieceId);
    const meshes = form
      ? [form.meshes.main, form.meshes.accent, form.meshes.own].filter((m) => m.indices.length > 0)
      : box
        ? [box.mesh]
        : [];
    if (meshes.length === 0) return null;
    const faces = meshDataToGeometry(mergeMeshData(meshes));
    const lines = new THREE.EdgesGeometry(faces, EDGE_ANGLE_DEG);
    const piece = pieces.find((p) => p.id === selectedPieceId);
    // A rug's form is drawn lifted (see FormGroupMesh): its highlight goes with it.
    const lift = form && piece && isWalkedOver(piece) ? FLAT_PIECE_LIFT_M : 0;
    return { faces, lines, lift };
  }, [pieceScene, pieces, forms, selectedPieceId]);
  useEffect(
    () => () => {
      built?.faces.dispose();
      built?.lines.dispose();
    },
    [built],
  );
  if (!built) return null;
  return (
    <group position-y={built.lift} userData={{ selectionHighlight: selectedPieceId }}>
      <mesh geometry={built.faces} material={materials.selectionTint} renderOrder={2} raycast={noRaycast} />
      <lineSegments geometry={built.lines} material={materials.selectionEdge} renderOrder={3} raycast={noRaycast} />
    </group>
  );
}

/** The highlight never takes a click: the piece under it does. */
const noRaycast = () => undefined;

/**
 * Every placed piece as its form: parts merged per material (one mesh for all plain colours, one
 * per photo finish worn), coloured per vertex so selection and recolouring rewrite one buffer.
 */
function PieceForms({
  forms,
  pieces,
  selectedPieceId,
  materials,
  onPieceClick,
}: Required<Pick<RoomPiecesProps, 'forms'>> & Omit<RoomPiecesProps, 'forms' | 'pieceScene'>) {
  const groups = useMemo(() => formGroups(forms.data, pieces, forms.finishes), [forms.data, forms.finishes, pieces]);
  return (
    <>
      {groups.map((group) => (
        <FormGroupMesh
          key={group.key}
          group={group}
          material={
            group.finish
              ? forms.finishMaterials.pieceMaterial(group.finish, group.flat)
              : group.flat
                ? materials.flatPiece
                : materials.piece
          }
          selectedPieceId={selectedPieceId}
          onPieceClick={onPieceClick}
        />
      ))}
    </>
  );
}

function FormGroupMesh({
  group,
  material,
  selectedPieceId,
  onPieceClick,
}: {
  group: FormGroup;
  material: THREE.Material;
  selectedPieceId: string | null;
  onPieceClick?: (id: string) => void;
}) {
  const invalidate = useThree((state) => state.invalidate);
  const merged = useMemo(() => {
    const meshes = group.entries.map((e) => e.mesh);
    const ranges: MergedRanges = mergedRanges(meshes);
    const geometry = meshDataToGeometry(mergeMeshData(meshes));
    const colours = new THREE.BufferAttribute(new Float32Array(ranges.vertexStarts[ranges.vertexStarts.length - 1] * 3), 3);
    geometry.setAttribute('color', colours);
    return { geometry, colours, ranges };
  }, [group]);
  useEffect(() => () => merged.geometry.dispose(), [merged]);
  useLayoutEffect(() => {
    merged.colours.copyArray(groupVertexColours(group, selectedPieceId));
    merged.colours.needsUpdate = true;
    invalidate();
  }, [merged, group, selectedPieceId, invalidate]);
  const pieceOfTriangle = useMemo(
    () => (triangle: number) => group.entries[partOfTriangle(merged.ranges, triangle)]?.pieceId ?? null,
    [group, merged],
  );
  const handlers: ClickHandlers = useClickHandlers(onPieceClick, pieceOfTriangle);
  // Rugs lie a few mm thick on the floor: lifted a little so the floor never shows through.
  return <mesh geometry={merged.geometry} material={material} position-y={group.flat ? FLAT_PIECE_LIFT_M : 0} {...handlers} />;
}

/**
 * Every placed piece, as its form or as its plain box, in a few merged meshes coloured per vertex;
 * a click is traced back to its piece through the hit triangle. The selected piece is tinted
 * towards the accent and highlighted: its form drawn again see-through in the accent, and outlined.
 */
export function RoomPieces(props: RoomPiecesProps) {
  const loaded = useLoadedModels(props.models);
  const { forms } = props;
  // A piece whose model has arrived is drawn by the model alone.
  const formsShown = useMemo(
    () => (forms && loaded.size > 0 ? { ...forms, data: forms.data.filter((d) => !loaded.has(d.id)) } : forms),
    [forms, loaded],
  );
  return (
    <group>
      {formsShown ? <PieceForms {...props} forms={formsShown} /> : <PieceBoxes {...props} />}
      {props.models && loaded.size > 0 && (
        <PieceModels
          pieces={props.pieces}
          sources={props.models}
          loaded={loaded}
          finishes={forms?.finishes}
          finishMaterials={forms?.finishMaterials}
          onPieceClick={props.onPieceClick}
        />
      )}
      <SelectionHighlight
        pieceScene={props.pieceScene}
        pieces={props.pieces}
        forms={formsShown}
        selectedPieceId={props.selectedPieceId}
        materials={props.materials}
      />
    </group>
  );
}

/** The plain boxes (what the checks measure), kept for comparing against the forms. */
function PieceBoxes({ pieceScene, pieces, selectedPieceId, materials, onPieceClick }: RoomPiecesProps) {
  const invalidate = useThree((state) => state.invalidate);
  const merged = useMemo(() => {
    const meshes = pieceScene.map((p) => p.mesh);
    const ranges = mergedRanges(meshes);
    if (meshes.length === 0) return { geometry: null, colours: null, ranges };
    const geometry = meshDataToGeometry(mergeMeshData(meshes));
    // One colour buffer per geometry, rewritten in place: a replaced attribute would leave its GPU buffer behind.
    const colours = new THREE.BufferAttribute(new Float32Array(ranges.vertexStarts[ranges.vertexStarts.length - 1] * 3), 3);
    geometry.setAttribute('color', colours);
    return { geometry, colours, ranges };
  }, [pieceScene]);
  useEffect(() => () => merged.geometry?.dispose(), [merged]);

  const looks = useMemo(() => {
    const byId = new Map(pieces.map((p) => [p.id, p]));
    return pieceScene.map((p) => ({ id: p.id, status: p.status, colour: byId.get(p.id)?.colour }));
  }, [pieceScene, pieces]);

  // Selection and colour changes rewrite one attribute instead of rebuilding the geometry.
  useLayoutEffect(() => {
    const colours = merged.colours;
    if (!colours) return;
    colours.copyArray(pieceVertexColours(looks, merged.ranges, selectedPieceId));
    colours.needsUpdate = true;
    invalidate();
  }, [merged, looks, selectedPieceId, invalidate]);

  const pieceOfTriangle = useMemo(
    () => (triangle: number) => pieceScene[partOfTriangle(merged.ranges, triangle)]?.id ?? null,
    [pieceScene, merged],
  );
  const handlers = useClickHandlers(onPieceClick, pieceOfTriangle);
  if (!merged.geometry) return null;
  return <mesh geometry={merged.geometry} material={materials.piece} castShadow receiveShadow {...handlers} />;
}
