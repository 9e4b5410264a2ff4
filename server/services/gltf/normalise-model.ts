// Normalising a checked glTF model for the client's walk-through, with the glTF library: read
// (meshopt-compressed geometry decoded with the meshoptimizer package), equal materials and data
// joined, unused parts pruned, vertices welded, parts sharing a material joined into one draw,
// simplified to the triangle budget, textures resized and re-encoded as WebP by sharp, written as
// one .glb. Also reads the model's size from its bounds and whether its unit looks wrong.
import { getBounds, Logger, NodeIO, type Document } from '@gltf-transform/core';
import { ALL_EXTENSIONS } from '@gltf-transform/extensions';
import { dedup, flatten, join, prune, simplify, textureCompress, weld } from '@gltf-transform/functions';
import { MeshoptDecoder, MeshoptSimplifier } from 'meshoptimizer';
import sharp from 'sharp';
import { MODEL_LIMITS, type ModelSize } from '../../../shared/schemas/piece-model';
import { ModelProblem, splitContainer } from './check-gltf';

/** The largest side a piece of furniture has, in metres: beyond it a model's unit is suspect (common practice). */
const LARGEST_PIECE_M = 12;
/** Errors tried in turn when simplifying, as a fraction of the mesh's radius (meshoptimizer's measure). */
const SIMPLIFY_ERRORS = [0.001, 0.005, 0.02, 0.05];

export type UnitHint = 'cm' | 'mm' | null;

export interface NormalisedModel {
  glb: Buffer;
  /** Bounds of the normalised model, in mm as authored (before any scale fix). */
  size: ModelSize;
  /** The bounds' lowest corner, mm (x, y up, z). */
  minMm: [number, number, number];
  triangles: number;
  /** Triangles before simplifying. */
  sourceTriangles: number;
  materials: number;
  textures: number;
  /** A size that looks authored in centimetres or millimetres but read as metres. */
  unitHint: UnitHint;
}

async function io(): Promise<NodeIO> {
  await MeshoptDecoder.ready;
  return new NodeIO()
    .setLogger(new Logger(Logger.Verbosity.ERROR))
    .registerExtensions(ALL_EXTENSIONS)
    .registerDependencies({ 'meshopt.decoder': MeshoptDecoder });
}

/** Triangles drawn by every triangle-list primitive of the document. */
export function countTriangles(doc: Document): number {
  let triangles = 0;
  for (const mesh of doc.getRoot().listMeshes())
    for (const prim of mesh.listPrimitives()) {
      if (prim.getMode() !== 4) continue;
      const indices = prim.getIndices();
      triangles += Math.floor((indices ? indices.getCount() : (prim.getAttribute('POSITION')?.getCount() ?? 0)) / 3);
    }
  return triangles;
}

/** Which unit a model's size suggests when it is far too large to be furniture in metres. */
export function unitHint(size: ModelSize): UnitHint {
  const largestM = Math.max(size.widthMm, size.depthMm, size.heightMm) / 1000;
  if (largestM <= LARGEST_PIECE_M) return null;
  return largestM / 100 <= LARGEST_PIECE_M ? 'cm' : 'mm';
}

/** Reads a checked upload (a .glb or an embedded .gltf) into a document. */
export async function readModel(buf: Buffer): Promise<Document> {
  const reader = await io();
  const { container, jsonText } = splitContainer(buf);
  const doc =
    container === 'glb'
      ? await reader.readBinary(new Uint8Array(buf))
      : await reader.readJSON({ json: JSON.parse(jsonText), resources: {} });
  return doc.setLogger(new Logger(Logger.Verbosity.ERROR));
}

export async function normaliseModel(buf: Buffer): Promise<NormalisedModel> {
  const doc = await readModel(buf);
  const writer = await io();
  // Compressed geometry is decoded on reading; the normalised file is written plain.
  for (const ext of doc.getRoot().listExtensionsUsed()) if (ext.extensionName === 'EXT_meshopt_compression') ext.dispose();
  const sourceTriangles = countTriangles(doc);
  await doc.transform(dedup(), prune(), flatten(), join(), weld());
  const materials = doc.getRoot().listMaterials().length;
  if (materials > MODEL_LIMITS.keptMaterials)
    throw new ModelProblem(
      422,
      'too_many_materials',
      `The model has ${materials} different materials after equal ones were joined; Parlour draws at most ${MODEL_LIMITS.keptMaterials} per model. Join materials in the modelling program and export again.`,
    );
  let triangles = countTriangles(doc);
  for (const error of SIMPLIFY_ERRORS) {
    if (triangles <= MODEL_LIMITS.keptTriangles) break;
    await doc.transform(
      simplify({ simplifier: MeshoptSimplifier, ratio: (MODEL_LIMITS.keptTriangles / triangles) * 0.98, error }),
    );
    triangles = countTriangles(doc);
  }
  if (triangles > MODEL_LIMITS.keptTriangles)
    throw new ModelProblem(
      422,
      'too_detailed',
      `The model keeps ${triangles.toLocaleString('en-GB')} triangles after simplifying; the most is ${MODEL_LIMITS.keptTriangles.toLocaleString('en-GB')}. Export a lighter version.`,
    );
  const px = MODEL_LIMITS.keptTexturePx;
  await doc.transform(textureCompress({ encoder: sharp, targetFormat: 'webp', resize: [px, px] }), prune());
  const scene = doc.getRoot().getDefaultScene() ?? doc.getRoot().listScenes()[0];
  if (!scene || countTriangles(doc) === 0)
    throw new ModelProblem(422, 'empty', 'The model has nothing to draw: no triangles in its scene.');
  const { min, max } = getBounds(scene);
  const mm = (v: number) => Math.round(v * 10_000) / 10;
  const size: ModelSize = { widthMm: mm(max[0] - min[0]), depthMm: mm(max[2] - min[2]), heightMm: mm(max[1] - min[1]) };
  const glb = Buffer.from(await writer.writeBinary(doc));
  return {
    glb,
    size,
    minMm: [mm(min[0]), mm(min[1]), mm(min[2])],
    triangles,
    sourceTriangles,
    materials,
    textures: doc.getRoot().listTextures().length,
    unitHint: unitHint(size),
  };
}
