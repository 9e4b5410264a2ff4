// Tests for the ceiling as the views show it: there over the head in Walk (at eye height), wearing
// the option's ceiling finish when it has one, and hidden when the Overview looks down from above.
import { describe, expect, it } from 'vitest';
import * as THREE from 'three';
import { buildShellScene } from '../../shared/geometry/scene';
import { createSceneMaterials } from './materials';
import { shellParts } from './shell-parts';
import { exampleShell } from './test-rooms';
import { surfaceMaterials, updateWallFade } from './view-helpers';
import { FinishMaterials } from './finish-materials';

const parts = shellParts(buildShellScene(exampleShell), exampleShell);
const materials = createSceneMaterials();

function ceilingSeenFrom(y: number): boolean {
  const camera = new THREE.PerspectiveCamera();
  camera.position.set(2.1, y, 1.8);
  const ceiling = new THREE.Mesh(new THREE.BufferGeometry(), materials.ceiling);
  updateWallFade(parts, camera, true, null, ceiling, materials, null);
  return ceiling.visible;
}

describe('the ceiling', () => {
  it('closes the room over the head in Walk and is hidden from above in the Overview', () => {
    expect(ceilingSeenFrom(1.6)).toBe(true);
    expect(ceilingSeenFrom(0.9)).toBe(true);
    expect(ceilingSeenFrom(exampleShell.wallHeight / 1000 + 3)).toBe(false);
  });

  it("wears the option's ceiling finish, and the plain paint white without one", () => {
    const finishes = new FinishMaterials(() => undefined);
    const paint = { kind: 'paint', colourHex: '#e8e4da', roughness: 0.9 } as const;
    const worn = surfaceMaterials({ ceiling: paint }, finishes).ceiling;
    expect(worn?.solid.color.getHexString()).toBe('e8e4da');
    expect(surfaceMaterials({}, finishes).ceiling).toBeUndefined();
    // Without a finish the shell draws materials.ceiling: a warm paint white.
    const white = materials.ceiling.color.getHSL({ h: 0, s: 0, l: 0 }, THREE.SRGBColorSpace);
    expect(white.l).toBeGreaterThan(0.93);
  });
});
