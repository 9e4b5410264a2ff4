// Materials for finishes: a paint is a colour; a photo finish is a texture repeating at its real
// size. Scene uvs are in metres, so a finish whose photo covers W × H mm repeats 1000/W times per
// metre along u and 1000/H along v.
import * as THREE from 'three';
import type { SceneFinish } from '../../shared/finishes/scene-finish';
import { textureRepeat } from '../../shared/geometry/texture-repeat';
import { FADED_WALL_OPACITY, FLAT_PIECE_OFFSET } from './materials';

/** What each surface of one option wears; anything missing keeps the plain default. */
export interface SurfaceFinishes {
  floor?: SceneFinish | null;
  ceiling?: SceneFinish | null;
  /** All walls' inside faces. */
  walls?: SceneFinish | null;
  /** A feature wall's inside face, by wall index. */
  wallOverrides?: Record<string, SceneFinish>;
  /** Pieces by id (drawn in the finish's colour, or a photo's mean colour). */
  pieces?: Record<string, SceneFinish>;
  /** Pieces' second finish (legs, frame, handles) by id. */
  pieceAccents?: Record<string, SceneFinish>;
}

export interface FinishMaterialPair {
  solid: THREE.MeshStandardMaterial;
  /** The see-through twin used when the wall stands between the eye and the room. */
  faded: THREE.MeshStandardMaterial;
}

/** Bytes per texel of an uploaded RGBA8 texture. */
const RGBA_BYTES = 4;
/** A full mipmap chain adds a third to the base level (1/4 + 1/16 + … → 1/3). */
const MIPMAP_FACTOR = 4 / 3;

/** Photo textures asked for and settled (loaded or failed), for a progress bar. */
export interface TextureProgress {
  settled: number;
  total: number;
}

/**
 * One view's finish materials, shared by every surface wearing the same finish, with textures
 * loaded once per URL. `onChange` is called when a texture arrives (render on demand);
 * `onProgress` each time a texture is asked for or settles.
 */
export class FinishMaterials {
  private readonly pairs = new Map<string, FinishMaterialPair>();
  private readonly pieceMaterials = new Map<string, THREE.MeshStandardMaterial>();
  private readonly textures = new Map<string, THREE.Texture>();
  private readonly loader = new THREE.TextureLoader();
  private readonly settledUrls = new Set<string>();
  private disposed = false;

  constructor(
    private readonly onChange: () => void,
    private readonly anisotropy = 4,
    private readonly onProgress?: (progress: TextureProgress) => void,
  ) {}

  /** How many of the asked-for textures have arrived or failed. */
  progress(): TextureProgress {
    return { settled: this.settledUrls.size, total: this.textures.size };
  }

  /**
   * GPU memory (bytes) the loaded textures take: width × height × 4 bytes, plus a third for the
   * mipmaps. Computed from the images' own sizes, so a larger upload shows here at once.
   */
  textureBytes(): number {
    let bytes = 0;
    for (const t of this.textures.values()) {
      const image = t.image as { width?: number; height?: number } | null | undefined;
      if (image?.width && image.height) bytes += image.width * image.height * RGBA_BYTES * MIPMAP_FACTOR;
    }
    return Math.round(bytes);
  }

  /**
   * The material pieces wear for a finish: coloured per vertex (so the selected piece can be
   * tinted) and pushed back a little so selection edges drawn on it never flicker; for pieces
   * walked over (`flat`, rugs) pulled forward instead, clear of the floor.
   */
  pieceMaterial(finish: Extract<SceneFinish, { kind: 'photo' }>, flat = false): THREE.MeshStandardMaterial {
    const key = `piece|${flat ? 'flat|' : ''}${JSON.stringify(finish)}`;
    const known = this.pieceMaterials.get(key);
    if (known) return known;
    const material = new THREE.MeshStandardMaterial({
      roughness: finish.roughness,
      metalness: 0,
      vertexColors: true,
      polygonOffset: true,
      polygonOffsetFactor: 1,
      polygonOffsetUnits: 1,
      ...(flat ? FLAT_PIECE_OFFSET : {}),
    });
    material.color.set(finish.meanColourHex);
    this.loadInto(finish, [material]);
    this.pieceMaterials.set(key, material);
    return material;
  }

  get(finish: SceneFinish): FinishMaterialPair {
    const key = JSON.stringify(finish);
    const known = this.pairs.get(key);
    if (known) return known;
    const solid = new THREE.MeshStandardMaterial({ roughness: finish.roughness, metalness: 0 });
    if (finish.kind === 'paint') solid.color.set(finish.colourHex);
    else {
      // The flat mean colour first; the photo replaces it as soon as it has loaded.
      solid.color.set(finish.meanColourHex);
      this.loadInto(finish, [solid]);
    }
    const faded = solid.clone();
    faded.transparent = true;
    faded.opacity = FADED_WALL_OPACITY;
    faded.depthWrite = false;
    if (finish.kind === 'photo') this.loadInto(finish, [faded]);
    const pair = { solid, faded };
    this.pairs.set(key, pair);
    return pair;
  }

  private loadInto(finish: Extract<SceneFinish, { kind: 'photo' }>, materials: THREE.MeshStandardMaterial[]): void {
    const key = `${finish.textureUrl}|${finish.repeatWidthMm}|${finish.repeatHeightMm}`;
    const apply = (texture: THREE.Texture) => {
      if (this.disposed) return;
      for (const m of materials) {
        m.map = texture;
        m.color.set('#ffffff');
        m.needsUpdate = true;
      }
      this.onChange();
    };
    const ready = this.textures.get(key);
    if (ready) {
      if (ready.image) apply(ready);
      else ready.userData.waiting = [...((ready.userData.waiting as (() => void)[] | undefined) ?? []), () => apply(ready)];
      return;
    }
    const settle = () => {
      this.settledUrls.add(key);
      if (!this.disposed) this.onProgress?.(this.progress());
    };
    const texture = this.loader.load(
      finish.textureUrl,
      (t) => {
        apply(t);
        for (const wait of (t.userData.waiting as (() => void)[] | undefined) ?? []) wait();
        t.userData.waiting = [];
        settle();
      },
      undefined,
      // A texture that cannot load leaves the surface in the finish's flat colour.
      settle,
    );
    texture.wrapS = THREE.RepeatWrapping;
    texture.wrapT = THREE.RepeatWrapping;
    const { repeatU, repeatV } = textureRepeat(finish);
    texture.repeat.set(repeatU, repeatV);
    texture.colorSpace = THREE.SRGBColorSpace;
    texture.anisotropy = this.anisotropy;
    this.textures.set(key, texture);
    this.onProgress?.(this.progress());
  }

  dispose(): void {
    this.disposed = true;
    for (const { solid, faded } of this.pairs.values()) {
      solid.dispose();
      faded.dispose();
    }
    for (const m of this.pieceMaterials.values()) m.dispose();
    for (const t of this.textures.values()) t.dispose();
    this.pieceMaterials.clear();
    this.pairs.clear();
    this.textures.clear();
    this.settledUrls.clear();
  }
}

/** The colour a piece is drawn in when it wears a finish. */
export function finishColourHex(finish: SceneFinish): string {
  return finish.kind === 'paint' ? finish.colourHex : finish.meanColourHex;
}
