// The first look at a model upload: sound models pass with their counts; each hostile file is refused
// with its reason; and the Khronos glTF validator (npm gltf-validator) agrees: what it reports as
// invalid, the check refuses too.
import { describe, expect, it } from 'vitest';
import { validateBytes } from 'gltf-validator';
import { MODEL_LIMITS } from '../../../shared/schemas/piece-model';
import { checkModelFile, ModelProblem } from './check-gltf';
import { chairDocument, chairWithHugeTexture, editGlbJson, manyBoxesDocument, toEmbeddedGltf, toGlb } from './test-models';

async function refusal(buf: Buffer): Promise<ModelProblem> {
  try {
    await checkModelFile(buf);
  } catch (err) {
    if (err instanceof ModelProblem) return err;
    throw err;
  }
  throw new Error('the file was accepted');
}

/** Errors the Khronos validator reports for the bytes (it never fetches: no resource function given). */
async function validatorErrors(buf: Buffer): Promise<number> {
  const report = await validateBytes(new Uint8Array(buf), { maxIssues: 50 });
  return report.issues.numErrors;
}

describe('checkModelFile', () => {
  it('reads a sound .glb chair: 6 boxes of 24 vertices, one mesh, two materials, one texture', async () => {
    const glb = await toGlb(await chairDocument());
    expect(await validatorErrors(glb)).toBe(0);
    expect(await checkModelFile(glb)).toEqual({
      container: 'glb',
      vertices: 144,
      meshes: 1,
      nodes: 1,
      materials: 2,
      textures: 1,
      extensions: [],
    });
  });

  it('reads the same chair as one .gltf with its data embedded', async () => {
    const gltf = await toEmbeddedGltf(await chairDocument());
    expect(await validatorErrors(gltf)).toBe(0);
    expect((await checkModelFile(gltf)).container).toBe('gltf');
  });

  it('refuses a text file renamed .glb, saying it is not a glTF model', async () => {
    const p = await refusal(Buffer.from('Shopping list: linen, oak, brass\n'));
    expect([p.status, p.code]).toEqual([415, 'not_gltf']);
    expect(p.message).toMatch(/not a glTF model/);
  });

  it('refuses a cut-short .glb, saying how many bytes its header promised', async () => {
    const glb = await toGlb(await chairDocument());
    const cut = glb.subarray(0, Math.floor(glb.length * 0.6));
    expect(await validatorErrors(cut)).toBeGreaterThan(0);
    const p = await refusal(cut);
    expect(p.code).toBe('truncated');
    expect(p.message).toContain(`${glb.length.toLocaleString('en-GB')} bytes`);
  });

  it('refuses an external URI without fetching it', async () => {
    const glb = await toGlb(await chairDocument());
    const outside = editGlbJson(glb, (json) => {
      (json.buffers as Record<string, unknown>[]).push({ byteLength: 16, uri: 'https://example.invalid/seat.bin' });
    });
    const p = await refusal(outside);
    expect(p.code).toBe('external_uri');
    expect(p.message).toContain('https://example.invalid/seat.bin');
    const image = editGlbJson(glb, (json) => {
      (json.images as Record<string, unknown>[])[0] = { uri: 'seat.png' };
    });
    expect((await refusal(image)).code).toBe('external_uri');
  });

  it('refuses an accessor that claims more than its buffer view holds (the validator reports it too)', async () => {
    const glb = await toGlb(await chairDocument());
    const lying = editGlbJson(glb, (json) => {
      const accessors = json.accessors as Record<string, unknown>[];
      accessors[0].count = (accessors[0].count as number) * 1000;
    });
    expect(await validatorErrors(lying)).toBeGreaterThan(0);
    const p = await refusal(lying);
    expect(p.code).toBe('bad_sizes');
    expect(p.message).toMatch(/Accessor 0 claims 24,000 items/);
  });

  it('refuses a buffer that claims more bytes than the file holds', async () => {
    const glb = await toGlb(await chairDocument());
    const lying = editGlbJson(glb, (json) => {
      const buffers = json.buffers as Record<string, number>[];
      buffers[0].byteLength *= 4;
    });
    expect(await validatorErrors(lying)).toBeGreaterThan(0);
    expect((await refusal(lying)).code).toBe('bad_sizes');
  });

  it('refuses a model over the vertex cap, saying how many it has and the most', async () => {
    // 150 boxes (3,600 vertices) drawn 139 times by one mesh: 500,400 vertices to draw.
    const glb = await toGlb(manyBoxesDocument(150));
    const heavy = editGlbJson(glb, (json) => {
      const mesh = (json.meshes as { primitives: unknown[] }[])[0];
      mesh.primitives = Array.from({ length: 139 }, () => mesh.primitives).flat();
    });
    const p = await refusal(heavy);
    expect(p.code).toBe('too_complex');
    expect(p.message).toContain('500,400 vertices');
    expect(p.message).toContain(MODEL_LIMITS.maxVertices.toLocaleString('en-GB'));
  });

  it('refuses a 20000 × 20000 texture from its header alone', async () => {
    const p = await refusal(await chairWithHugeTexture(20000, 20000));
    expect(p.code).toBe('texture_too_large');
    expect(p.message).toContain('20,000 × 20,000 px (400 megapixels)');
  });

  it('refuses compression it has no decoder for, naming it', async () => {
    const glb = await toGlb(await chairDocument());
    const draco = editGlbJson(glb, (json) => {
      json.extensionsUsed = ['KHR_draco_mesh_compression'];
      json.extensionsRequired = ['KHR_draco_mesh_compression'];
    });
    const p = await refusal(draco);
    expect(p.code).toBe('unsupported_extension');
    expect(p.message).toContain('Draco');
  });

  it('refuses glTF 1.0 and a damaged description', async () => {
    const glb = await toGlb(await chairDocument());
    const old = editGlbJson(glb, (json) => {
      json.asset = { version: '1.0' };
    });
    expect((await refusal(old)).code).toBe('not_gltf2');
    const broken = Buffer.from(glb);
    broken.write('}}}}', 20);
    expect(await validatorErrors(broken)).toBeGreaterThan(0);
    expect((await refusal(broken)).code).toBe('damaged');
  });
});
