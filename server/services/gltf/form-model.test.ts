// Models made from Parlour's own forms: they measure their piece's box, carry "main" and "accent"
// materials, and pass the Khronos glTF validator (npm gltf-validator) before and after normalising.
import { describe, expect, it } from 'vitest';
import { validateBytes } from 'gltf-validator';
import { pieceSchema } from '../../../shared/schemas/option';
import { formModelDocument } from './form-model';
import { normaliseModel, readModel } from './normalise-model';
import { toGlb } from './test-models';

const sofa = pieceSchema.parse({
  id: 's',
  name: 'Sofa',
  x: 0,
  y: 0,
  width: 2100,
  depth: 900,
  height: 850,
  status: 'new',
  kind: 'sofa',
  settings: { base: 'legs' },
});

describe('formModelDocument', () => {
  it('makes a sofa model the size of its box, valid, with main and accent materials', async () => {
    const glb = await toGlb(formModelDocument(sofa, { main: '#a89f91', accent: '#5b4636' }));
    expect((await validateBytes(new Uint8Array(glb))).issues.numErrors).toBe(0);
    const model = await normaliseModel(glb);
    expect((await validateBytes(new Uint8Array(model.glb))).issues.numErrors).toBe(0);
    for (const [got, want] of [
      [model.size.widthMm, 2100],
      [model.size.depthMm, 900],
      [model.size.heightMm, 850],
    ])
      expect(got).toBeCloseTo(want, 0);
    expect(model.minMm[1]).toBeCloseTo(0, 3);
    const names = (await readModel(model.glb))
      .getRoot()
      .listMaterials()
      .map((m) => m.getName());
    expect(names).toEqual(expect.arrayContaining(['main', 'accent']));
    expect(model.triangles).toBeLessThanOrEqual(2000);
  });
});
