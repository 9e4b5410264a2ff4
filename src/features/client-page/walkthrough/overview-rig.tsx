// The walk-through's Overview rig: orbit round the room from above, with animated turn, zoom and
// top-view moves. It publishes its pose on the camera link after every move and follows the
// Overview poses the other views publish.
import { OrbitControls } from '@react-three/drei';
import { useFrame, useThree } from '@react-three/fiber';
import { useEffect, useEffectEvent, useLayoutEffect, useRef } from 'react';
import type { Bounds3 } from '../../../../shared/geometry/scene';
import type { ViewPose } from './camera-link';
import { refitToAspect, type OverviewFrame } from '../../../scene/framing';
import { ORBIT_LIMITS, useOrbitFraming, type OrbitHandle } from '../../../scene/orbit';
import { easeInOut, orbitBetween, orbitTurn, orbitZoom, topViewPose } from './view-moves';
import { MAX_FRAME_S, MOVE_MS, OVERVIEW_FOV_DEG, now, type RigHandle, type RigProps } from './rig-shared';

/** One press of a turn button moves the Overview this far round the room (degrees). */
const ORBIT_STEP_DEG = 30;
/** One press of a zoom button comes this much closer (the inverse goes further). */
const ZOOM_STEP = 0.8;
/** Held keys turn the Overview this fast (degrees per second) and come closer at this rate (share per second). */
const ORBIT_SPEED_DEG_S = 60;
const ZOOM_RATE_S = 0.9;

interface Tween {
  from: ViewPose;
  to: ViewPose;
  start: number;
  durationMs: number;
}

interface OverviewRigProps extends RigProps {
  bounds: Bounds3;
}

const framePose = (f: OverviewFrame): ViewPose => ({ mode: 'overview', position: f.position, target: f.target });
const frameDistance = (f: OverviewFrame) =>
  Math.hypot(f.position[0] - f.target[0], f.position[1] - f.target[1], f.position[2] - f.target[2]);

export function OverviewRig({ bounds, onView, link, viewId, memory, reducedMotion, held, rig, onMoveStart }: OverviewRigProps) {
  const controls = useRef<OrbitHandle>(null);
  const camera = useThree((state) => state.camera);
  const invalidate = useThree((state) => state.invalidate);
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
  // The frame depends on the bounds alone: a resize or a piece moved keeps the view.
  // A view that changes shape (Compare opened or closed) keeps its camera's direction and is moved
  // nearer or further so the room fills its new size as it filled the old.
  const frame = useOrbitFraming(
    controls,
    bounds,
    (f) => {
      const shared = link?.latest?.mode === 'overview' ? link.latest : null;
      apply(memory.current ?? shared ?? framePose(f), true);
    },
    OVERVIEW_FOV_DEG,
    (_, fromAspect, toAspect) => {
      tween.current = null;
      const pose = current();
      const position = refitToAspect(pose.position, pose.target, bounds, OVERVIEW_FOV_DEG, fromAspect, toAspect);
      apply({ ...pose, position }, true);
    },
  );

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
      {...ORBIT_LIMITS}
      // Moving the target sideways loses the room; turning and zooming are all a client needs.
      enablePan={false}
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
