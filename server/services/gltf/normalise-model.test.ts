// Normalising models: sizes read from bounds exactly, kept within 1 % after simplifying, textures
// re-encoded as WebP within 1,024 px, a centimetre sofa flagged, and every normalised file passing
// the Khronos glTF validator (npm gltf-validator) with no errors.
import { describe, expect, it } from 'vitest';
import { validateBytes } from 'gltf-validator';
import { MODEL_LIMITS } from '../../../shared/schemas/piece-model';
import { countTriangles, normaliseModel, readModel, unitHint } from './normalise-model';
import { centimetreSofaDocument, chairDocument, toEmbeddedGltf, toGlb } from './test-models';

async function validatorReport(glb: Buffer) {
  const report = await validateBytes(new Uint8Array(glb), { maxIssues: 50 });
  return {
    errors: report.issues.numErrors,
    messages: report.issues.messages.filter((m) => m.severity === 0).map((m) => m.message),
  };
}

describe('normaliseModel', () => {
  it('reads the chair of boxes at its exact size, 450 × 500 × 900 mm, with its texture as WebP', async () => {
    const model = await normaliseModel(await toGlb(await chairDocument({ texturePx: 2048 })));
    expect(model.size).toEqual({ widthMm: 450, depthMm: 500, heightMm: 900 });
    expect(model.minMm).toEqual([-225, 0, -250]);
    expect(model.unitHint).toBeNull();
    expect(model.materials).toBe(2);
    expect(model.triangles).toBe(72);
    expect(await validatorReport(model.glb)).toEqual({ errors: 0, messages: [] });
    const doc = await readModel(model.glb);
    const [texture] = doc.getRoot().listTextures();
    expect(texture.getMimeType()).toBe('image/webp');
    expect(Math.max(...(texture.getSize() ?? [0, 0]))).toBeLessThanOrEqual(MODEL_LIMITS.keptTexturePx);
    // Parts sharing a material are joined: one draw per material.
    expect(
      doc
        .getRoot()
        .listMeshes()
        .flatMap((m) => m.listPrimitives()),
    ).toHaveLength(2);
  });

  it('reads an embedded .gltf the same as the .glb', async () => {
    const model = await normaliseModel(await toEmbeddedGltf(await chairDocument()));
    expect(model.size).toEqual({ widthMm: 450, depthMm: 500, heightMm: 900 });
  });

  it('simplifies a dense chair to the triangle budget, its size within 1 % of the original', async () => {
    const glb = await toGlb(await chairDocument({ cushionSegments: 160 }));
    const model = await normaliseModel(glb);
    expect(model.sourceTriangles).toBe(72 + 2 * 160 * 160);
    expect(model.triangles).toBeLessThanOrEqual(MODEL_LIMITS.keptTriangles);
    expect(countTriangles(await readModel(model.glb))).toBe(model.triangles);
    for (const [got, want] of [
      [model.size.widthMm, 450],
      [model.size.depthMm, 500],
      [model.size.heightMm, 900],
    ])
      expect(Math.abs(got - want) / want).toBeLessThanOrEqual(0.01);
    expect((await validatorReport(model.glb)).errors).toBe(0);
  });

  it('turned to face −X, the chair measures 500 wide and 450 deep', async () => {
    const model = await normaliseModel(await toGlb(await chairDocument({ facing: 'x-' })));
    expect(model.size.widthMm).toBeCloseTo(500, 3);
    expect(model.size.depthMm).toBeCloseTo(450, 3);
  });

  it('flags a sofa authored in centimetres: 210 m read as metres', async () => {
    const model = await normaliseModel(await toGlb(await centimetreSofaDocument()));
    expect(model.size).toEqual({ widthMm: 210_000, depthMm: 90_000, heightMm: 85_000 });
    expect(model.unitHint).toBe('cm');
  });
});

describe('unitHint', () => {
  it('takes furniture in metres as it is, and names centimetres or millimetres by size', () => {
    expect(unitHint({ widthMm: 2100, depthMm: 900, heightMm: 850 })).toBeNull();
    expect(unitHint({ widthMm: 210_000, depthMm: 90_000, heightMm: 85_000 })).toBe('cm');
    expect(unitHint({ widthMm: 2_100_000, depthMm: 900_000, heightMm: 850_000 })).toBe('mm');
  });
});
