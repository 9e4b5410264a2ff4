// The two ways of moving the camera in the walk-through: the Overview (orbit round the room from
// above) and Walk (at eye height on the floor, stopped by walls and pieces). Each publishes its
// pose on the camera link after every move and follows the poses the other views publish.
import { OrbitControls } from '@react-three/drei';
import { useFrame, useThree } from '@react-three/fiber';
import { useEffect, useEffectEvent, useLayoutEffect, useRef, type ComponentRef } from 'react';
import * as THREE from 'three';
import type { Bounds3 } from '../../../../shared/geometry/scene';
import { moveBody, walkLine, walkStart, type WalkObstacles } from '../../../../shared/geometry/walk';
import type { RoomShell } from '../../../../shared/schemas/room';
import type { CameraLink, ViewPose } from './camera-link';
import { overviewFrame, type OverviewFrame } from '../../../scene/framing';
import {
  MAX_PITCH_DEG,
  easeInOut,
  forwardOf,
  orbitBetween,
  orbitTurn,
  orbitZoom,
  topViewPose,
  walkPose,
  walkStateOf,
  yawOfPlanHeading,
  type WalkState,
} from './view-moves';

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
  /** Walk straight towards a floor point (scene metres), stopping short of anything in the way. */
  walkTo(x: number, z: number): void;
  /** A held move started or stopped: draw a frame so it is picked up. */
  wake(): void;
  /** True while the camera is on its way somewhere (an animated move or a held key). */
  busy(): boolean;
}

/** The Overview's vertical field of view (degrees): a calm, little-distorted model view. */
export const OVERVIEW_FOV_DEG = 40;
/** Walk's vertical field of view (degrees): wide enough to see a wall and the floor before it from a step away. */
export const WALK_FOV_DEG = 62;
/** The eye stays this far (radians) above the horizon of the target, so it never dips under the floor. */
const MAX_POLAR_ANGLE = Math.PI / 2 - 0.08;
/** One press of a turn button moves the Overview this far round the room (degrees). */
const ORBIT_STEP_DEG = 30;
/** One press of a zoom button comes this much closer (the inverse goes further). */
const ZOOM_STEP = 0.8;
/** Held keys turn the Overview this fast (degrees per second) and come closer at this rate (share per second). */
const ORBIT_SPEED_DEG_S = 60;
const ZOOM_RATE_S = 0.9;
/** How long an animated camera move takes (ms): quick enough not to wait for, slow enough to follow. */
const MOVE_MS = 450;
/** Walking pace (m/s): an unhurried indoor walk (common practice, no source). */
const WALK_SPEED_M_S = 1.2;
/** Walking to a clicked point goes a little faster, so a long way across the room does not drag. */
const GLIDE_SPEED_M_S = 1.8;
/** Held turn keys turn this fast (degrees per second); a turn button press turns one step. */
const TURN_SPEED_DEG_S = 80;
const TURN_STEP_DEG = 30;
/** One press of a move button from the keyboard walks this far (m). */
const WALK_STEP_M = 0.5;
/** Dragging turns the view this much per pixel (radians): a drag across the view turns it about half round. */
const LOOK_RAD_PER_PX = 0.004;
/**
 * A frame longer than this (s) — the first after a pause — moves as if it were this long, so
 * nothing jumps; short of it, the pace keeps up even on slow software rendering.
 */
const MAX_FRAME_S = 0.25;

const DEG = Math.PI / 180;
const now = () => performance.now();

interface Tween {
  from: ViewPose;
  to: ViewPose;
  start: number;
  durationMs: number;
}

interface OverviewRigProps {
  bounds: Bounds3;
  onView: (camera: THREE.Camera) => void;
  link?: CameraLink;
  viewId: string;
  /** The last Overview pose of this view, kept while it is in Walk. */
  memory: React.RefObject<ViewPose | null>;
  reducedMotion: boolean;
  held: React.RefObject<HeldMoves>;
  rig: React.RefObject<RigHandle | null>;
  /** Called as a move starts, before its first frame (the host marks itself moving). */
  onMoveStart: () => void;
}

const framePose = (f: OverviewFrame): ViewPose => ({ mode: 'overview', position: f.position, target: f.target });
const frameDistance = (f: OverviewFrame) =>
  Math.hypot(f.position[0] - f.target[0], f.position[1] - f.target[1], f.position[2] - f.target[2]);

export function OverviewRig({ bounds, onView, link, viewId, memory, reducedMotion, held, rig, onMoveStart }: OverviewRigProps) {
  const controls = useRef<ComponentRef<typeof OrbitControls>>(null);
  const camera = useThree((state) => state.camera);
  const size = useThree((state) => state.size);
  const invalidate = useThree((state) => state.invalidate);
  const sizeRef = useRef(size);
  sizeRef.current = size;
  const frame = useRef<OverviewFrame | null>(null);
  const tween = useRef<Tween | null>(null);
  const applying = useRef(false);
  const live = useRef({ onView, reducedMotion, onMoveStart });
  live.current = { onView, reducedMotion, onMoveStart };

  const current = (): ViewPose => ({
    mode: 'overview',
    position: camera.position.toArray() as [number, number, number],
    target: (controls.current?.target.toArray() ?? [0, 0, 0]) as [number, number, number],
  });
  const apply = (pose: ViewPose, publish: boolean) => {
    const orbit = controls.current;
    camera.position.set(...pose.position);
    if (orbit) {
      orbit.target.set(...pose.target);
      // update() raises a change event: this move is already being reported.
      applying.current = true;
      orbit.update();
      applying.current = false;
    } else camera.lookAt(...pose.target);
    memory.current = pose;
    live.current.onView(camera);
    if (publish) link?.publish(viewId, pose);
    invalidate();
  };
  const goTo = (pose: ViewPose) => {
    live.current.onMoveStart();
    if (live.current.reducedMotion) {
      tween.current = null;
      apply(pose, true);
    } else {
      tween.current = { from: current(), to: pose, start: now(), durationMs: MOVE_MS };
      invalidate();
    }
  };
  // Repeated presses build on where the last one is going, not on where the camera is mid-move.
  const base = () => tween.current?.to ?? current();
  // Effects call the latest apply without re-running when it is rebuilt (it reads only refs and props).
  const applyPose = useEffectEvent(apply);
  const placeInFrame = useEffectEvent((f: OverviewFrame) => {
    const shared = link?.latest?.mode === 'overview' ? link.latest : null;
    apply(memory.current ?? shared ?? framePose(f), true);
  });

  const [minX, minY, minZ] = bounds.min;
  const [maxX, maxY, maxZ] = bounds.max;
  // Keyed on the numbers, not the object: a resize or a piece moved must not throw away the view.
  useLayoutEffect(() => {
    const orbit = controls.current;
    if (!(camera instanceof THREE.PerspectiveCamera) || !orbit) return;
    camera.fov = OVERVIEW_FOV_DEG;
    const { width, height } = sizeRef.current;
    const f = overviewFrame({ min: [minX, minY, minZ], max: [maxX, maxY, maxZ] }, camera.fov, width / Math.max(height, 1));
    frame.current = f;
    camera.near = f.near;
    camera.far = f.far;
    camera.updateProjectionMatrix();
    orbit.minDistance = f.minDistance;
    orbit.maxDistance = f.maxDistance;
    placeInFrame(f);
    // The frame depends on the bounds alone: a resize or a piece moved keeps the view.
  }, [camera, minX, minY, minZ, maxX, maxY, maxZ]);

  useEffect(() => {
    if (!link) return undefined;
    return link.subscribe(viewId, (pose) => {
      if (pose.mode !== 'overview') return;
      tween.current = null;
      applyPose(pose, false);
    });
  }, [link, viewId]);

  useLayoutEffect(() => {
    const handle: RigHandle = {
      turn: (d) => goTo(orbitTurn(base(), d * ORBIT_STEP_DEG)),
      zoom: (d) => {
        const f = frame.current;
        if (f) goTo(orbitZoom(base(), d < 0 ? ZOOM_STEP : 1 / ZOOM_STEP, f.minDistance, f.maxDistance));
      },
      topView: () => {
        const f = frame.current;
        if (f) goTo(topViewPose(f.target, frameDistance(f)));
      },
      reset: () => {
        if (frame.current) goTo(framePose(frame.current));
      },
      step: () => undefined,
      walkTo: () => undefined,
      wake: () => invalidate(),
      busy: () => tween.current !== null || held.current.any,
    };
    rig.current = handle;
    return () => {
      if (rig.current === handle) rig.current = null;
    };
  });

  useFrame((_, rawDt) => {
    const dt = Math.min(rawDt, MAX_FRAME_S);
    let pose: ViewPose | null = null;
    const t = tween.current;
    if (t) {
      const k = (now() - t.start) / t.durationMs;
      pose = k >= 1 ? t.to : orbitBetween(t.from, t.to, easeInOut(k));
      if (k >= 1) tween.current = null;
    }
    const keys = held.current;
    const f = frame.current;
    if (keys.any && f) {
      tween.current = null;
      let p = pose ?? current();
      if (keys.has('turn-left')) p = orbitTurn(p, -ORBIT_SPEED_DEG_S * dt);
      if (keys.has('turn-right')) p = orbitTurn(p, ORBIT_SPEED_DEG_S * dt);
      if (keys.has('forward')) p = orbitZoom(p, 1 - ZOOM_RATE_S * dt, f.minDistance, f.maxDistance);
      if (keys.has('back')) p = orbitZoom(p, 1 + ZOOM_RATE_S * dt, f.minDistance, f.maxDistance);
      pose = p;
    }
    if (pose) apply(pose, true);
  });

  return (
    <OrbitControls
      ref={controls}
      makeDefault
      enableDamping={false}
      // Moving the target sideways loses the room; turning and zooming are all a client needs.
      enablePan={false}
      maxPolarAngle={MAX_POLAR_ANGLE}
      onStart={() => (tween.current = null)}
      onChange={() => {
        if (applying.current) return;
        const pose = current();
        memory.current = pose;
        live.current.onView(camera);
        link?.publish(viewId, pose);
      }}
    />
  );
}

interface WalkRigProps {
  shell: RoomShell;
  /** What stops the walker in the option on show, plan mm. */
  obstacles: WalkObstacles;
  eyeM: number;
  onView: (camera: THREE.Camera) => void;
  link?: CameraLink;
  viewId: string;
  /** The last Walk pose of this view, kept while it is in the Overview. */
  memory: React.RefObject<ViewPose | null>;
  reducedMotion: boolean;
  held: React.RefObject<HeldMoves>;
  rig: React.RefObject<RigHandle | null>;
  onMoveStart: () => void;
}

interface Glide {
  from: WalkState;
  to: WalkState;
  start: number;
  durationMs: number;
}

const MM_PER_M = 1000;

function turnBetween(a: number, b: number, t: number): number {
  let d = b - a;
  while (d > Math.PI) d -= 2 * Math.PI;
  while (d < -Math.PI) d += 2 * Math.PI;
  return a + d * t;
}

export function WalkRig({
  shell,
  obstacles,
  eyeM,
  onView,
  link,
  viewId,
  memory,
  reducedMotion,
  held,
  rig,
  onMoveStart,
}: WalkRigProps) {
  const camera = useThree((state) => state.camera);
  const gl = useThree((state) => state.gl);
  const invalidate = useThree((state) => state.invalidate);
  const state = useRef<WalkState | null>(null);
  const glide = useRef<Glide | null>(null);
  const live = useRef({ obstacles, eyeM, onView, reducedMotion, shell, onMoveStart });
  live.current = { obstacles, eyeM, onView, reducedMotion, shell, onMoveStart };

  const apply = (publish: boolean) => {
    const s = state.current;
    if (!s) return;
    const pose = walkPose(s, live.current.eyeM);
    camera.position.set(...pose.position);
    camera.lookAt(...pose.target);
    camera.updateMatrixWorld();
    memory.current = pose;
    live.current.onView(camera);
    if (publish) link?.publish(viewId, pose);
    invalidate();
  };
  const startState = (): WalkState => {
    const start = walkStart(live.current.shell, live.current.obstacles);
    return {
      x: start.position[0] / MM_PER_M,
      z: start.position[1] / MM_PER_M,
      yaw: yawOfPlanHeading(start.headingDeg),
      pitch: 0,
    };
  };
  const glideTo = (to: WalkState, distanceM: number, speed: number) => {
    const from = state.current;
    if (!from) return;
    live.current.onMoveStart();
    if (live.current.reducedMotion) {
      glide.current = null;
      state.current = to;
      apply(true);
      return;
    }
    const turnMs = (Math.abs(turnBetween(from.yaw, to.yaw, 1) - from.yaw) / (TURN_SPEED_DEG_S * DEG)) * 1000;
    glide.current = {
      from: { ...from },
      to,
      start: now(),
      durationMs: Math.max(MOVE_MS / 2, (distanceM / speed) * 1000, turnMs),
    };
    invalidate();
  };
  // Effects call the latest apply without re-running when it is rebuilt (it reads only refs and props).
  const applyView = useEffectEvent(apply);
  const placeAtStart = useEffectEvent(() => {
    const shared = link?.latest?.mode === 'walk' ? link.latest : null;
    const from = memory.current ?? shared;
    state.current = from ? walkStateOf(from) : startState();
    apply(true);
  });
  // Where a move from the state ends, stopped and slid along by walls and pieces.
  const moved = (s: WalkState, forwardM: number, rightM: number): WalkState => {
    const [fx, fz] = forwardOf(s.yaw);
    const [rx, rz] = [-fz, fx];
    const dx = fx * forwardM + rx * rightM;
    const dz = fz * forwardM + rz * rightM;
    const [px, pz] = moveBody(live.current.obstacles, [s.x * MM_PER_M, s.z * MM_PER_M], [dx * MM_PER_M, dz * MM_PER_M]);
    return { ...s, x: px / MM_PER_M, z: pz / MM_PER_M };
  };

  useLayoutEffect(() => {
    if (camera instanceof THREE.PerspectiveCamera) {
      camera.fov = WALK_FOV_DEG;
      camera.near = 0.05;
      camera.far = 100;
      camera.updateProjectionMatrix();
    }
    placeAtStart();
    // Runs once per camera: the rig reads everything else through refs.
  }, [camera]);

  useLayoutEffect(() => {
    applyView(true);
  }, [eyeM]);

  useEffect(() => {
    if (!link) return undefined;
    return link.subscribe(viewId, (pose) => {
      if (pose.mode !== 'walk') return;
      glide.current = null;
      state.current = walkStateOf(pose);
      applyView(false);
    });
  }, [link, viewId]);

  // Drag to look round: the picture follows the pointer, as if turning a photo of the room.
  useEffect(() => {
    const element = gl.domElement;
    let last: { x: number; y: number } | null = null;
    const down = (e: PointerEvent) => {
      if (e.button === 0) last = { x: e.clientX, y: e.clientY };
    };
    const move = (e: PointerEvent) => {
      const s = state.current;
      if (!last || !s) return;
      const dx = e.clientX - last.x;
      const dy = e.clientY - last.y;
      last = { x: e.clientX, y: e.clientY };
      glide.current = null;
      const limit = MAX_PITCH_DEG * DEG;
      state.current = {
        ...s,
        yaw: s.yaw + dx * LOOK_RAD_PER_PX,
        pitch: Math.max(-limit, Math.min(limit, s.pitch + dy * LOOK_RAD_PER_PX)),
      };
      applyView(true);
    };
    const up = () => {
      last = null;
    };
    element.addEventListener('pointerdown', down);
    window.addEventListener('pointermove', move);
    window.addEventListener('pointerup', up);
    window.addEventListener('pointercancel', up);
    return () => {
      element.removeEventListener('pointerdown', down);
      window.removeEventListener('pointermove', move);
      window.removeEventListener('pointerup', up);
      window.removeEventListener('pointercancel', up);
    };
  }, [gl]);

  useLayoutEffect(() => {
    const stepOf = (move: WalkMove) => {
      const s = glide.current?.to ?? state.current;
      if (!s) return;
      switch (move) {
        case 'turn-left':
          return glideTo({ ...s, yaw: s.yaw + TURN_STEP_DEG * DEG }, 0, WALK_SPEED_M_S);
        case 'turn-right':
          return glideTo({ ...s, yaw: s.yaw - TURN_STEP_DEG * DEG }, 0, WALK_SPEED_M_S);
        default: {
          const forward = move === 'forward' ? WALK_STEP_M : move === 'back' ? -WALK_STEP_M : 0;
          const right = move === 'right' ? WALK_STEP_M : move === 'left' ? -WALK_STEP_M : 0;
          const to = moved(s, forward, right);
          return glideTo(to, Math.hypot(to.x - s.x, to.z - s.z), WALK_SPEED_M_S);
        }
      }
    };
    const handle: RigHandle = {
      turn: (d) => stepOf(d < 0 ? 'turn-left' : 'turn-right'),
      zoom: () => undefined,
      topView: () => undefined,
      reset: () => {
        const s = state.current;
        const to = startState();
        if (s) glideTo(to, Math.hypot(to.x - s.x, to.z - s.z), GLIDE_SPEED_M_S);
      },
      step: stepOf,
      walkTo: (x, z) => {
        const s = state.current;
        if (!s) return;
        const [ex, ez] = walkLine(live.current.obstacles, [s.x * MM_PER_M, s.z * MM_PER_M], [x * MM_PER_M, z * MM_PER_M]);
        const to = { ...s, x: ex / MM_PER_M, z: ez / MM_PER_M };
        const distance = Math.hypot(to.x - s.x, to.z - s.z);
        // Face the way to the point: a walk goes where one looks.
        const towards = Math.hypot(x - s.x, z - s.z) > 0 ? Math.atan2(-(x - s.x), -(z - s.z)) : s.yaw;
        glideTo({ ...to, yaw: towards }, distance, GLIDE_SPEED_M_S);
      },
      wake: () => invalidate(),
      busy: () => glide.current !== null || held.current.any,
    };
    rig.current = handle;
    return () => {
      if (rig.current === handle) rig.current = null;
    };
  });

  useFrame((_, rawDt) => {
    const dt = Math.min(rawDt, MAX_FRAME_S);
    const s = state.current;
    if (!s) return;
    let next: WalkState | null = null;
    const g = glide.current;
    if (g) {
      const k = Math.min(1, (now() - g.start) / g.durationMs);
      const e = easeInOut(k);
      next = {
        x: g.from.x + (g.to.x - g.from.x) * e,
        z: g.from.z + (g.to.z - g.from.z) * e,
        yaw: turnBetween(g.from.yaw, g.to.yaw, e),
        pitch: g.from.pitch + (g.to.pitch - g.from.pitch) * e,
      };
      if (k >= 1) glide.current = null;
    }
    const keys = held.current;
    if (keys.any) {
      glide.current = null;
      let n = next ?? s;
      const turn = (keys.has('turn-left') ? 1 : 0) - (keys.has('turn-right') ? 1 : 0);
      if (turn !== 0) n = { ...n, yaw: n.yaw + turn * TURN_SPEED_DEG_S * DEG * dt };
      const forward = (keys.has('forward') ? 1 : 0) - (keys.has('back') ? 1 : 0);
      const right = (keys.has('right') ? 1 : 0) - (keys.has('left') ? 1 : 0);
      const length = Math.hypot(forward, right);
      if (length > 0) n = moved(n, (forward / length) * WALK_SPEED_M_S * dt, (right / length) * WALK_SPEED_M_S * dt);
      next = n;
    }
    if (next) {
      state.current = next;
      apply(true);
    }
  });

  return null;
}
