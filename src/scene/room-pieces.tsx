import type { ThreeEvent } from '@react-three/fiber';
import { useThree } from '@react-three/fiber';
import { useEffect, useLayoutEffect, useMemo } from 'react';
import * as THREE from 'three';
import type { PieceSceneData } from '../../shared/geometry/scene';
import type { Piece } from '../../shared/schemas/option';
import { mergeMeshData, mergedRanges, meshDataToGeometry, partOfTriangle } from './build-geometry';
import type { SceneMaterials } from './materials';
import { pieceVertexColours } from './piece-colours';

/** A press that moves further than this (CSS pixels) was an orbit, not a click on a piece. */
export const CLICK_SLOP_PX = 5;
/** Only corners sharper than this (degrees) get a selection edge, i.e. a box's twelve edges. */
const EDGE_ANGLE_DEG = 30;

interface RoomPiecesProps {
  pieceScene: readonly PieceSceneData[];
  pieces: readonly Piece[];
  selectedPieceId: string | null;
  materials: SceneMaterials;
  onPieceClick?: (id: string) => void;
}

/**
 * Every placed piece as one merged mesh (one draw call however many pieces), coloured per vertex;
 * a click is traced back to its piece through the hit triangle. The selected piece is tinted
 * towards the accent and outlined.
 */
export function RoomPieces({ pieceScene, pieces, selectedPieceId, materials, onPieceClick }: RoomPiecesProps) {
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

  const edges = useMemo(() => {
    const selected = pieceScene.find((p) => p.id === selectedPieceId);
    if (!selected) return null;
    const faces = meshDataToGeometry(selected.mesh);
    const lines = new THREE.EdgesGeometry(faces, EDGE_ANGLE_DEG);
    faces.dispose();
    return lines;
  }, [pieceScene, selectedPieceId]);
  useEffect(() => () => edges?.dispose(), [edges]);

  const handlers = useMemo(() => {
    if (!onPieceClick) return {};
    const setCursor = (event: ThreeEvent<PointerEvent>, cursor: string) => {
      const canvas = event.nativeEvent.target;
      if (canvas instanceof HTMLElement) canvas.style.cursor = cursor;
    };
    return {
      onClick: (event: ThreeEvent<MouseEvent>) => {
        event.stopPropagation();
        if (event.delta > CLICK_SLOP_PX || event.faceIndex == null) return;
        const part = partOfTriangle(merged.ranges, event.faceIndex);
        if (part >= 0) onPieceClick(pieceScene[part].id);
      },
      onPointerOver: (event: ThreeEvent<PointerEvent>) => setCursor(event, 'pointer'),
      onPointerOut: (event: ThreeEvent<PointerEvent>) => setCursor(event, ''),
    };
  }, [onPieceClick, merged, pieceScene]);

  if (!merged.geometry) return null;
  return (
    <group>
      <mesh geometry={merged.geometry} material={materials.piece} castShadow receiveShadow {...handlers} />
      {edges && <lineSegments geometry={edges} material={materials.selectionEdge} />}
    </group>
  );
}
