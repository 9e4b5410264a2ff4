// What both 3D views build for a room's shell inside their canvas: the scene's own materials, the
// finish materials, the shell's parts and the window lights, each disposed with the view.
import { useThree } from '@react-three/fiber';
import { useEffect, useMemo, useRef } from 'react';
import { buildShellScene } from '../../shared/geometry/scene';
import type { RoomShell } from '../../shared/schemas/room';
import { FinishMaterials, type TextureProgress } from './finish-materials';
import { createSceneMaterials, disposeSceneMaterials } from './materials';
import { shellParts } from './shell-parts';
import { tryBuild } from './view-helpers';
import { windowLightRects } from './window-lights';

/**
 * Materials and shell geometry for one view; call inside the canvas with a shell that keeps its
 * identity while its content does (useStableValue). `onTextureProgress` hears about photo
 * textures asked for and settled; it may change from render to render.
 */
export function useSceneResources(shell: RoomShell, onTextureProgress?: (progress: TextureProgress) => void) {
  const invalidate = useThree((state) => state.invalidate);
  const gl = useThree((state) => state.gl);

  const materials = useMemo(createSceneMaterials, []);
  useEffect(() => () => disposeSceneMaterials(materials), [materials]);
  const progressRef = useRef(onTextureProgress);
  progressRef.current = onTextureProgress;
  const finishMaterials = useMemo(
    // Progress is reported after the current render: materials are asked for while rendering.
    () =>
      new FinishMaterials(
        () => invalidate(),
        Math.min(8, gl.capabilities.getMaxAnisotropy()),
        (p) => queueMicrotask(() => progressRef.current?.(p)),
      ),
    [invalidate, gl],
  );
  useEffect(() => () => finishMaterials.dispose(), [finishMaterials]);

  const parts = useMemo(() => tryBuild('room', () => shellParts(buildShellScene(shell), shell)), [shell]);
  const windows = useMemo(() => tryBuild('windows', () => windowLightRects(shell)) ?? [], [shell]);
  return { invalidate, materials, finishMaterials, parts, windows };
}
