// The walk-through's Walk rig: at eye height on the floor, stopped by walls and pieces; keys and
// buttons step and turn, a drag looks round, a click on the floor walks there. It publishes its
// pose on the camera link after every move and follows the Walk poses the other views publish.
import { useFrame, useThree } from '@react-three/fiber';
import { useEffect, useEffectEvent, useLayoutEffect, useRef } from 'react';
import * as THREE from 'three';
import { moveBody, walkLine, walkStart, type WalkObstacles } from '../../../../shared/geometry/walk';
import { findWalkPath } from '../../../../shared/geometry/walk-path';
import type { RoomShell } from '../../../../shared/schemas/room';
import { MAX_PITCH_DEG, easeInOut, forwardOf, walkPose, walkStateOf, yawOfPlanHeading, type WalkState } from './view-moves';
import { DEG, MAX_FRAME_S, MOVE_MS, WALK_FOV_DEG, now, type RigHandle, type RigProps, type WalkMove } from './rig-shared';

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

interface WalkRigProps extends RigProps {
  shell: RoomShell;
  /** What stops the walker in the option on show, plan mm. */
  obstacles: WalkObstacles;
  eyeM: number;
  /** A click on floor that cannot be reached (no room to stand there, or walled off). */
  onNoWay?: () => void;
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
  onNoWay,
}: WalkRigProps) {
  const camera = useThree((state) => state.camera);
  const gl = useThree((state) => state.gl);
  const invalidate = useThree((state) => state.invalidate);
  const state = useRef<WalkState | null>(null);
  const glide = useRef<Glide | null>(null);
  // The legs still to walk of a way found to a clicked point (see walkTo), walked one after another.
  const route = useRef<WalkState[]>([]);
  const live = useRef({ obstacles, eyeM, onView, reducedMotion, shell, onMoveStart, onNoWay });
  live.current = { obstacles, eyeM, onView, reducedMotion, shell, onMoveStart, onNoWay };

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
  const nextLeg = () => {
    const s = state.current;
    const to = route.current.shift();
    if (!s || !to) return;
    glideTo(to, Math.hypot(to.x - s.x, to.z - s.z), GLIDE_SPEED_M_S);
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
      route.current = [];
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
        route.current = [];
        const s = state.current;
        const to = startState();
        if (s) glideTo(to, Math.hypot(to.x - s.x, to.z - s.z), GLIDE_SPEED_M_S);
      },
      step: stepOf,
      walkTo: (x, z) => {
        const s = state.current;
        if (!s) return;
        route.current = [];
        const from: [number, number] = [s.x * MM_PER_M, s.z * MM_PER_M];
        const way = findWalkPath(live.current.obstacles, from, [x * MM_PER_M, z * MM_PER_M]);
        // No way there (no room to stand, or walled off): walk straight towards it until stopped.
        const points = way ?? [walkLine(live.current.obstacles, from, [x * MM_PER_M, z * MM_PER_M])];
        // Each leg faces the way it goes: a walk goes where one looks.
        let prev = s;
        const legs = points.map(([px, pz]) => {
          const leg = { ...prev, x: px / MM_PER_M, z: pz / MM_PER_M };
          const [dx, dz] = [leg.x - prev.x, leg.z - prev.z];
          leg.yaw = Math.hypot(dx, dz) > 0 ? Math.atan2(-dx, -dz) : prev.yaw;
          prev = leg;
          return leg;
        });
        if (!way) {
          live.current.onNoWay?.();
          // Face the clicked point itself, as before, even when stopped short of it.
          const towards = Math.hypot(x - s.x, z - s.z) > 0 ? Math.atan2(-(x - s.x), -(z - s.z)) : s.yaw;
          legs[0] = { ...legs[0], yaw: towards };
        }
        if (live.current.reducedMotion) {
          const last = legs[legs.length - 1];
          glideTo(last, 0, GLIDE_SPEED_M_S);
          return;
        }
        route.current = legs;
        nextLeg();
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
    const legDone = g !== null && glide.current === null;
    const keys = held.current;
    if (keys.any) {
      glide.current = null;
      route.current = [];
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
    if (legDone && route.current.length > 0) nextLeg();
  });

  return null;
}
