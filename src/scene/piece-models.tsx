// Pieces that wear a model from the studio's library: each model fitted into its piece's box
// (shared/geometry/model-fit.ts), turned and placed like the piece, clickable as the piece. Until a
// model has arrived (or if it fails) the piece keeps its drawn form: the caller hides the form only
// for the pieces listed as loaded.
import type { ThreeEvent } from '@react-three/fiber';
import { useThree } from '@react-three/fiber';
import { useEffect, useMemo, useState } from 'react';
import * as THREE from 'three';
import { fitModelInBox } from '../../shared/geometry/model-fit';
import type { SceneFinish } from '../../shared/finishes/scene-finish';
import type { Piece } from '../../shared/schemas/option';
import type { FinishMaterials, SurfaceFinishes } from './finish-materials';
import { loadModel, type LoadedModel } from './model-loader';

/** What a piece's model is drawn from: its file, its quarter turn and whether it wears the piece's finishes. */
export interface ModelSource {
  url: string;
  turnDeg: number;
  wearsFinishes: boolean;
}

const MM_TO_M = 0.001;
const DEG = Math.PI / 180;
/** A press that moves further than this (CSS pixels) was an orbit, not a click on a piece. */
const CLICK_SLOP_PX = 5;
/** Model materials named like this take the piece's main or accent finish, when the piece asks. */
const MAIN_NAME = /^main\b|main finish/i;
const ACCENT_NAME = /^accent\b|accent finish/i;

/** The model of each placed piece that wears one, by piece id. */
export function modelSources(pieces: readonly (Piece & { model?: ModelSource })[]): ReadonlyMap<string, ModelSource> {
  const out = new Map<string, ModelSource>();
  for (const p of pieces)
    if (p.placed && p.model) out.set(p.id, { url: p.model.url, turnDeg: p.model.turnDeg, wearsFinishes: p.model.wearsFinishes });
  return out;
}

/** The loaded models of `sources`, by piece id; asks for any not loaded yet and redraws as they arrive. */
export function useLoadedModels(sources: ReadonlyMap<string, ModelSource> | undefined): ReadonlyMap<string, LoadedModel> {
  const [byUrl, setByUrl] = useState<ReadonlyMap<string, LoadedModel>>(new Map());
  const invalidate = useThree((s) => s.invalidate);
  const urls = useMemo(() => [...new Set([...(sources?.values() ?? [])].map((s) => s.url))].sort().join('\n'), [sources]);
  useEffect(() => {
    let live = true;
    for (const url of urls ? urls.split('\n') : []) {
      loadModel(url).then(
        (model) => {
          if (!live) return;
          setByUrl((was) => (was.get(url) === model ? was : new Map(was).set(url, model)));
          invalidate();
        },
        () => undefined, // the form stays
      );
    }
    return () => {
      live = false;
    };
  }, [urls, invalidate]);
  return useMemo(() => {
    const out = new Map<string, LoadedModel>();
    for (const [pieceId, source] of sources ?? []) {
      const model = byUrl.get(source.url);
      if (model) out.set(pieceId, model);
    }
    return out;
  }, [sources, byUrl]);
}

/** What a placed model's "main" and "accent" materials wear: a colour ("#rrggbb"), "photo #rrggbb", or absent (its own). */
export interface ModelWears {
  main?: string;
  accent?: string;
}

/** The `userData` key of a placed model's group: its piece id and what it wears (browser tests read it). */
export const PLACED_MODEL_KEY = 'placedModel';
export interface PlacedModelData {
  pieceId: string;
  wears: ModelWears;
}

const wornWords = (m: THREE.Material) => {
  const standard = m as THREE.MeshStandardMaterial;
  const hex = standard.color ? `#${standard.color.getHexString()}` : '';
  return standard.map ? `photo ${hex}` : hex;
};

function dressedCopy(
  model: LoadedModel,
  main: THREE.Material | null,
  accent: THREE.Material | null,
): { copy: THREE.Group; wears: ModelWears } {
  const copy = model.scene.clone(true);
  const wears: ModelWears = {};
  if (!main && !accent) return { copy, wears };
  copy.traverse((o) => {
    const mesh = o as THREE.Mesh;
    if (!mesh.isMesh || Array.isArray(mesh.material)) return;
    const name = mesh.material.name ?? '';
    if (main && MAIN_NAME.test(name)) {
      mesh.material = main;
      wears.main = wornWords(main);
    } else if (accent && ACCENT_NAME.test(name)) {
      mesh.material = accent;
      wears.accent = wornWords(accent);
    }
  });
  return { copy, wears };
}

/** The placed models drawn in `scene` (visible ones only), by piece id, for the view's host attribute. */
export function shownModels(scene: THREE.Object3D): Record<string, ModelWears> {
  const out: Record<string, ModelWears> = {};
  scene.traverseVisible((o) => {
    const placed = o.userData[PLACED_MODEL_KEY] as PlacedModelData | undefined;
    if (placed) out[placed.pieceId] = placed.wears;
  });
  return out;
}

function PlacedModel({
  piece,
  model,
  source,
  finishes,
  finishMaterials,
  onPieceClick,
}: {
  piece: Piece;
  model: LoadedModel;
  source: ModelSource;
  finishes?: SurfaceFinishes;
  finishMaterials?: FinishMaterials;
  onPieceClick?: (id: string) => void;
}) {
  const fit = useMemo(() => fitModelInBox(model.bounds, source.turnDeg, piece), [model, source.turnDeg, piece]);
  const {
    copy: object,
    wears,
    owned,
  } = useMemo(() => {
    const made: THREE.Material[] = [];
    const materialOf = (finish: SceneFinish | undefined, colour: string | undefined) => {
      if (finish && finish.kind === 'photo' && finishMaterials) {
        // The forms' photo material takes its tint from vertex colours, which a model has not got:
        // a copy without them (sharing the texture) keeps the photo's own colours.
        const m = finishMaterials.pieceMaterial(finish).clone();
        m.vertexColors = false;
        made.push(m);
        return m;
      }
      const hex = finish && finish.kind === 'paint' ? finish.colourHex : colour;
      if (!hex) return null;
      const m = new THREE.MeshStandardMaterial({ color: hex, roughness: finish?.roughness ?? 0.8 });
      made.push(m);
      return m;
    };
    const main = source.wearsFinishes ? materialOf(finishes?.pieces?.[piece.id], piece.colour) : null;
    const accent = source.wearsFinishes ? materialOf(finishes?.pieceAccents?.[piece.id], piece.accentColour) : null;
    return { ...dressedCopy(model, main, accent), owned: made };
  }, [model, source.wearsFinishes, finishes, finishMaterials, piece.id, piece.colour, piece.accentColour]);
  useEffect(() => () => owned.forEach((m) => m.dispose()), [owned]);
  const placed = useMemo<PlacedModelData>(() => ({ pieceId: piece.id, wears }), [piece.id, wears]);
  if (!fit) return null;
  const onClick = onPieceClick
    ? (event: ThreeEvent<MouseEvent>) => {
        event.stopPropagation();
        if (event.delta <= CLICK_SLOP_PX) onPieceClick(piece.id);
      }
    : undefined;
  return (
    <group
      position={[piece.x * MM_TO_M, piece.elevation * MM_TO_M, piece.y * MM_TO_M]}
      rotation-y={-piece.rotation * DEG}
      onClick={onClick}
      name={`model:${piece.id}`}
      userData={{ [PLACED_MODEL_KEY]: placed }}
    >
      <group scale={fit.scale}>
        <group rotation-y={fit.turnRad}>
          <group position={fit.offset}>
            <primitive object={object} />
          </group>
        </group>
      </group>
    </group>
  );
}

/** Every loaded model, placed in its piece. */
export function PieceModels({
  pieces,
  sources,
  loaded,
  finishes,
  finishMaterials,
  onPieceClick,
}: {
  pieces: readonly Piece[];
  sources: ReadonlyMap<string, ModelSource>;
  loaded: ReadonlyMap<string, LoadedModel>;
  finishes?: SurfaceFinishes;
  finishMaterials?: FinishMaterials;
  onPieceClick?: (id: string) => void;
}) {
  return (
    <>
      {pieces.map((piece) => {
        const model = loaded.get(piece.id);
        const source = sources.get(piece.id);
        if (!model || !source) return null;
        return (
          <PlacedModel
            key={piece.id}
            piece={piece}
            model={model}
            source={source}
            finishes={finishes}
            finishMaterials={finishMaterials}
            onPieceClick={onPieceClick}
          />
        );
      })}
    </>
  );
}
