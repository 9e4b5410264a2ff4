// What the walk-through's two camera rigs (the Overview and Walk) share: the moves held down, the
// handle the view's buttons and keys reach, the props every rig takes, and the common timings.
import type * as THREE from 'three';
import type { CameraLink, ViewPose } from './camera-link';

export type WalkMove = 'forward' | 'back' | 'left' | 'right' | 'turn-left' | 'turn-right';

/**
 * The moves held down right now, from the keys and from the on-screen buttons apart: leaving the
 * view lets go of its keys, but not of a button being pressed outside it.
 */
export class HeldMoves {
  readonly keys = new Set<WalkMove>();
  readonly buttons = new Set<WalkMove>();

  has(move: WalkMove): boolean {
    return this.keys.has(move) || this.buttons.has(move);
  }

  get any(): boolean {
    return this.keys.size > 0 || this.buttons.size > 0;
  }

  clear(): void {
    this.keys.clear();
    this.buttons.clear();
  }
}

/** What the view's buttons and keys reach in whichever rig is active. */
export interface RigHandle {
  turn(direction: -1 | 1): void;
  zoom(direction: -1 | 1): void;
  topView(): void;
  reset(): void;
  step(move: WalkMove): void;
  /**
   * Walk to a floor point (scene metres) along the way found round leaves and pieces; where there is
   * no way, straight towards it until stopped (the view then says so).
   */
  walkTo(x: number, z: number): void;
  /** A held move started or stopped: draw a frame so it is picked up. */
  wake(): void;
  /** True while the camera is on its way somewhere (an animated move or a held key). */
  busy(): boolean;
}

/** What every rig is given by the view it moves. */
export interface RigProps {
  onView: (camera: THREE.Camera) => void;
  link?: CameraLink;
  viewId: string;
  /** The last pose of this view in this rig's mode, kept while the view is in the other mode. */
  memory: React.RefObject<ViewPose | null>;
  reducedMotion: boolean;
  held: React.RefObject<HeldMoves>;
  rig: React.RefObject<RigHandle | null>;
  /** Called as a move starts, before its first frame (the host marks itself moving). */
  onMoveStart: () => void;
}

/** The Overview's vertical field of view (degrees): a calm, little-distorted model view. */
export const OVERVIEW_FOV_DEG = 40;
/** Walk's vertical field of view (degrees): wide enough to see a wall and the floor before it from a step away. */
export const WALK_FOV_DEG = 62;
/** How long an animated camera move takes (ms): quick enough not to wait for, slow enough to follow. */
export const MOVE_MS = 450;
/**
 * A frame longer than this (s) — the first after a pause — moves as if it were this long, so
 * nothing jumps; short of it, the pace keeps up even on slow software rendering.
 */
export const MAX_FRAME_S = 0.25;

export const DEG = Math.PI / 180;
export const now = () => performance.now();
