// The scene's own materials: the default colours of walls, floor, ceiling and pieces before a finish
// is chosen, the selection tint and the faded near walls. Finishes (paint colours and photo textures
// at their real repeat size) are made in finish-materials.ts.
import * as THREE from 'three';
import { WINDOW_STENCIL } from './outside-view';

/** Parlour's accent, used to mark the selected piece. */
export const SELECTION_COLOUR = '#2f6b5c';
/** How far the selected piece's colour moves towards the accent (0 none, 1 all). */
export const SELECTION_TINT = 0.55;
/** How strongly the selected piece's form glows in the accent over its own colours (0–1). */
export const SELECTION_GLOW_OPACITY = 0.22;
/** Calm neutrals for pieces without a colour, so what the client owns and what is proposed differ a little. */
export const PIECE_COLOURS = { existing: '#a99d8f', new: '#d8cdbd' } as const;
/** Legs, frames and handles of pieces without an accent: a darker tone of the same neutrals. */
export const ACCENT_COLOURS = { existing: '#6d6157', new: '#8a7a68' } as const;
/** Opacity of a wall between the eye and the room in the Overview. */
export const FADED_WALL_OPACITY = 0.14;
export const SCENE_BACKGROUND = '#f7f3ec';
/** Pieces walked over (rugs) are drawn lifted this far (m) off the floor, clear of its depth. */
export const FLAT_PIECE_LIFT_M = 0.003;
/**
 * …and pulled towards the eye as the floor's soft shadows are, where the other pieces are pushed
 * back (for their selection edges): a rug a few mm thick then never fights the floor for depth.
 */
export const FLAT_PIECE_OFFSET = { polygonOffset: true, polygonOffsetFactor: -1, polygonOffsetUnits: -1 } as const;

export interface SceneMaterials {
  wall: THREE.MeshStandardMaterial;
  wallFaded: THREE.MeshStandardMaterial;
  floor: THREE.MeshStandardMaterial;
  ceiling: THREE.MeshStandardMaterial;
  doorLeaf: THREE.MeshStandardMaterial;
  handle: THREE.MeshStandardMaterial;
  windowFrame: THREE.MeshStandardMaterial;
  windowFrameFaded: THREE.MeshStandardMaterial;
  glass: THREE.MeshStandardMaterial;
  piece: THREE.MeshStandardMaterial;
  /** The same for pieces walked over (rugs), drawn just above the floor. */
  flatPiece: THREE.MeshStandardMaterial;
  selectionEdge: THREE.LineBasicMaterial;
  /** The selected piece's form drawn again over it: a see-through glow of the accent. */
  selectionTint: THREE.MeshBasicMaterial;
}

function faded(material: THREE.MeshStandardMaterial): THREE.MeshStandardMaterial {
  const copy = material.clone();
  copy.transparent = true;
  copy.opacity = FADED_WALL_OPACITY;
  // Without this a faded wall would still hide whatever is drawn after it.
  copy.depthWrite = false;
  return copy;
}

/** One set of materials for a view; every mesh of the same kind shares one. Dispose with disposeSceneMaterials. */
export function createSceneMaterials(): SceneMaterials {
  const wall = new THREE.MeshStandardMaterial({ color: '#f1ece4', roughness: 0.9, metalness: 0 });
  const windowFrame = new THREE.MeshStandardMaterial({ color: '#f4f1ea', roughness: 0.6, metalness: 0 });
  const piece = new THREE.MeshStandardMaterial({
    vertexColors: true,
    roughness: 0.85,
    metalness: 0,
    // Pushes the faces back a little so the selection edges drawn on them never flicker.
    polygonOffset: true,
    polygonOffsetFactor: 1,
    polygonOffsetUnits: 1,
  });
  return {
    wall,
    wallFaded: faded(wall),
    floor: new THREE.MeshStandardMaterial({ color: '#c8a983', roughness: 0.8, metalness: 0 }),
    ceiling: new THREE.MeshStandardMaterial({ color: '#f6f3ee', roughness: 0.95, metalness: 0 }),
    // A painted leaf a shade deeper than the trim, so its lighter edges and the handles show from above.
    doorLeaf: new THREE.MeshStandardMaterial({ color: '#d9cfc0', roughness: 0.7, metalness: 0 }),
    handle: new THREE.MeshStandardMaterial({ color: '#6f6a63', roughness: 0.35, metalness: 0.6 }),
    windowFrame,
    windowFrameFaded: faded(windowFrame),
    // The glass marks the stencil: the outside (outside-view.tsx) is drawn only through it.
    glass: new THREE.MeshStandardMaterial({
      color: '#cfe3ec',
      roughness: 0.05,
      metalness: 0,
      transparent: true,
      opacity: 0.28,
      depthWrite: false,
      stencilWrite: true,
      stencilRef: WINDOW_STENCIL,
      stencilFunc: THREE.AlwaysStencilFunc,
      stencilZPass: THREE.ReplaceStencilOp,
    }),
    piece,
    flatPiece: Object.assign(piece.clone(), FLAT_PIECE_OFFSET),
    selectionEdge: new THREE.LineBasicMaterial({ color: SELECTION_COLOUR }),
    selectionTint: new THREE.MeshBasicMaterial({
      color: SELECTION_COLOUR,
      transparent: true,
      opacity: SELECTION_GLOW_OPACITY,
      depthWrite: false,
      // Drawn on the piece's own faces: pulled towards the eye so it lies over them, not in them.
      polygonOffset: true,
      polygonOffsetFactor: -2,
      polygonOffsetUnits: -2,
    }),
  };
}

export function disposeSceneMaterials(materials: SceneMaterials): void {
  for (const material of Object.values(materials)) material.dispose();
}
