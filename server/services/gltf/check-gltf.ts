// First look at an uploaded glTF 2.0 model, before anything is stored or decoded: the binary
// container's header and chunks, the JSON, every buffer, view and accessor size, every URI (only data
// packed in the file is accepted; nothing is ever fetched), the counts a piece of furniture needs and
// the size of every texture read from its header. Bounded work: one pass over the JSON, no geometry.
import sharp from 'sharp';
import { MODEL_LIMITS } from '../../../shared/schemas/piece-model';

/** Why a model cannot be used: a code for the API, a sentence for the designer, an HTTP status. */
export class ModelProblem extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
  ) {
    super(message);
  }
}

const refuse = (code: string, message: string, status = 422): never => {
  throw new ModelProblem(status, code, message);
};

/** Extensions the normaliser can read and write back (all Khronos ratified ones without compression). */
const READABLE_EXTENSIONS = new Set([
  'KHR_materials_clearcoat',
  'KHR_materials_emissive_strength',
  'KHR_materials_ior',
  'KHR_materials_sheen',
  'KHR_materials_specular',
  'KHR_materials_transmission',
  'KHR_materials_unlit',
  'KHR_materials_variants',
  'KHR_materials_volume',
  'KHR_mesh_quantization',
  'KHR_texture_transform',
  'EXT_texture_webp',
  // Read with the decoder that ships in the `meshoptimizer` package from npm.
  'EXT_meshopt_compression',
]);

/** Compression Parlour has no decoder for: said plainly rather than read wrong. */
const UNREADABLE_EXTENSIONS: Record<string, string> = {
  KHR_draco_mesh_compression: 'Draco-compressed geometry',
  KHR_texture_basisu: 'KTX2 (Basis) textures',
};

const GLB_MAGIC = 0x46546c67; // "glTF"
const CHUNK_JSON = 0x4e4f534a;
const CHUNK_BIN = 0x004e4942;

const COMPONENT_BYTES: Record<number, number> = { 5120: 1, 5121: 1, 5122: 2, 5123: 2, 5125: 4, 5126: 4 };
const TYPE_COMPONENTS: Record<string, number> = { SCALAR: 1, VEC2: 2, VEC3: 3, VEC4: 4, MAT2: 4, MAT3: 9, MAT4: 16 };

export type ModelContainer = 'glb' | 'gltf';

export interface ModelHeader {
  container: ModelContainer;
  /** Counts read from the JSON. */
  vertices: number;
  meshes: number;
  nodes: number;
  materials: number;
  textures: number;
  extensions: string[];
}

type Json = Record<string, unknown>;
const list = (json: Json, key: string): Json[] => {
  const v = json[key];
  if (v === undefined) return [];
  if (!Array.isArray(v)) refuse('damaged', `The model's “${key}” is not a list: the file is damaged.`);
  return (v as unknown[]).map((item, i) =>
    item && typeof item === 'object' ? (item as Json) : refuse('damaged', `The model's ${key}[${i}] is damaged.`),
  );
};
const count = (v: unknown, what: string): number =>
  typeof v === 'number' && Number.isInteger(v) && v >= 0
    ? v
    : refuse('damaged', `${what} is not a whole number: the file is damaged.`);
const optionalCount = (v: unknown, what: string): number => (v === undefined ? 0 : count(v, what));

const n = (v: number) => v.toLocaleString('en-GB');
const mb = (bytes: number) => `${Math.round(bytes / 1024 / 102.4) / 10} MB`;

/** Bytes a base64 data URI holds, from its length alone. */
function dataUriBytes(uri: string): number | null {
  const m = /^data:[^,]*;base64,/i.exec(uri);
  if (!m) return null;
  const body = uri.length - m[0].length;
  const pad = uri.endsWith('==') ? 2 : uri.endsWith('=') ? 1 : 0;
  return Math.floor((body * 3) / 4) - pad;
}

function checkUri(uri: unknown, what: string): string | null {
  if (uri === undefined) return null;
  if (typeof uri !== 'string') return refuse('damaged', `${what} has a damaged address.`);
  if (/^data:/i.test(uri)) return uri;
  const shown = uri.length > 60 ? `${uri.slice(0, 57)}…` : uri;
  return refuse(
    'external_uri',
    `${what} points to an outside file (“${shown}”). Parlour never fetches those: export the model as one .glb, or as .gltf with the data embedded.`,
  );
}

/** The container: a .glb's JSON and binary chunks, or a .gltf's JSON; refuses anything else. */
export function splitContainer(buf: Buffer): { container: ModelContainer; jsonText: string; bin: Buffer | null } {
  if (buf.length >= 4 && buf.readUInt32LE(0) === GLB_MAGIC) {
    if (buf.length < 20) refuse('truncated', 'The model file is cut short: it ends inside its header.');
    const version = buf.readUInt32LE(4);
    if (version !== 2)
      refuse('not_gltf2', `This is a glTF ${version} file; Parlour reads glTF 2.0. Export it again as glTF 2.0.`);
    const declared = buf.readUInt32LE(8);
    if (declared > buf.length)
      refuse('truncated', `The model file is cut short: its header says ${n(declared)} bytes, the upload has ${n(buf.length)}.`);
    const jsonLength = buf.readUInt32LE(12);
    if (buf.readUInt32LE(16) !== CHUNK_JSON)
      refuse('damaged', 'The model file is damaged: its first part is not its description.');
    if (jsonLength > MODEL_LIMITS.maxJsonBytes)
      refuse('too_complex', `The model's description is ${mb(jsonLength)}; the most is ${mb(MODEL_LIMITS.maxJsonBytes)}.`);
    if (20 + jsonLength > declared) refuse('truncated', 'The model file is cut short: it ends inside its description.');
    const jsonText = buf.subarray(20, 20 + jsonLength).toString('utf8');
    let bin: Buffer | null = null;
    const binAt = 20 + jsonLength;
    if (binAt + 8 <= declared) {
      const binLength = buf.readUInt32LE(binAt);
      const binType = buf.readUInt32LE(binAt + 4);
      if (binType === CHUNK_BIN) {
        if (binAt + 8 + binLength > declared) refuse('truncated', 'The model file is cut short: it ends inside its data.');
        bin = buf.subarray(binAt + 8, binAt + 8 + binLength);
      }
    } else if (binAt !== declared && binAt + 8 > declared) {
      refuse('truncated', 'The model file is cut short: it ends inside a chunk header.');
    }
    return { container: 'glb', jsonText, bin };
  }
  // A .gltf is JSON text: a byte-order mark or spaces may come before the opening brace.
  let at = 0;
  if (buf.length >= 3 && buf[0] === 0xef && buf[1] === 0xbb && buf[2] === 0xbf) at = 3;
  while (at < buf.length && at < 1024 && (buf[at] === 0x20 || buf[at] === 0x0a || buf[at] === 0x0d || buf[at] === 0x09)) at++;
  if (buf[at] !== 0x7b)
    return refuse('not_gltf', 'This is not a glTF model. Upload a .glb file, or a .gltf file with its data embedded.', 415);
  return { container: 'gltf', jsonText: buf.subarray(at).toString('utf8'), bin: null };
}

function parseJson(text: string): Json {
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch {
    return refuse('damaged', 'The model file is damaged: its description cannot be read.');
  }
  if (!json || typeof json !== 'object' || Array.isArray(json))
    return refuse('damaged', 'The model file is damaged: its description cannot be read.');
  const asset = (json as Json).asset as Json | undefined;
  const version = asset && typeof asset.version === 'string' ? asset.version : null;
  if (version === null)
    return refuse('not_gltf', 'This is not a glTF model: it has no glTF version. Upload a .glb or .gltf file.', 415);
  if (!version.startsWith('2.'))
    refuse('not_gltf2', `This is a glTF ${version} file; Parlour reads glTF 2.0. Export it again as glTF 2.0.`);
  return json as Json;
}

interface Sized {
  byteLength: number;
}

/** Checks sizes, references and counts in the JSON against the data the file holds; returns the counts. */
function checkDescription(
  json: Json,
  container: ModelContainer,
  bin: Buffer | null,
): Omit<ModelHeader, 'container'> & { imageBytes: (Buffer | null)[] } {
  const extensionsRequired = Array.isArray(json.extensionsRequired) ? (json.extensionsRequired as unknown[]).map(String) : [];
  const extensionsUsed = Array.isArray(json.extensionsUsed) ? (json.extensionsUsed as unknown[]).map(String) : [];
  for (const name of new Set([...extensionsRequired, ...extensionsUsed])) {
    if (UNREADABLE_EXTENSIONS[name])
      refuse(
        'unsupported_extension',
        `The model uses ${UNREADABLE_EXTENSIONS[name]} (${name}), which Parlour cannot read. Export it without compression.`,
      );
    if (!READABLE_EXTENSIONS.has(name) && extensionsRequired.includes(name))
      refuse('unsupported_extension', `The model needs the extension ${name}, which Parlour cannot read. Export it without it.`);
  }

  const buffers = list(json, 'buffers');
  const bufferSizes: Sized[] = buffers.map((b, i) => {
    const byteLength = count(b.byteLength, `Buffer ${i}'s size`);
    const uri = checkUri(b.uri, `Buffer ${i}`);
    const held = uri !== null ? dataUriBytes(uri) : i === 0 && container === 'glb' ? (bin?.length ?? 0) : null;
    if (held === null)
      refuse('damaged', `Buffer ${i} has no data in the file${container === 'gltf' ? ' (a .gltf must embed its data)' : ''}.`);
    if (byteLength > (held ?? 0))
      refuse(
        'bad_sizes',
        `Buffer ${i} claims ${n(byteLength)} bytes but the file holds ${n(held ?? 0)}: the file is damaged or cut short.`,
      );
    return { byteLength };
  });

  const views = list(json, 'bufferViews').map((v, i) => {
    const buffer = count(v.buffer, `Buffer view ${i}'s buffer`);
    const offset = optionalCount(v.byteOffset, `Buffer view ${i}'s offset`);
    const byteLength = count(v.byteLength, `Buffer view ${i}'s size`);
    const stride = v.byteStride === undefined ? null : count(v.byteStride, `Buffer view ${i}'s stride`);
    const into = bufferSizes[buffer];
    if (!into) refuse('damaged', `Buffer view ${i} refers to buffer ${buffer}, which the file does not have.`);
    if (offset + byteLength > into.byteLength)
      refuse(
        'bad_sizes',
        `Buffer view ${i} reaches ${n(offset + byteLength)} bytes into buffer ${buffer}, which holds ${n(into.byteLength)}.`,
      );
    return { buffer, offset, byteLength, stride };
  });

  const accessors = list(json, 'accessors');
  if (accessors.length > MODEL_LIMITS.maxAccessors)
    refuse('too_complex', `The model has ${n(accessors.length)} accessors; the most is ${n(MODEL_LIMITS.maxAccessors)}.`);
  const accessorCounts = accessors.map((a, i) => {
    const items = count(a.count, `Accessor ${i}'s count`);
    const componentBytes = COMPONENT_BYTES[a.componentType as number];
    const components = TYPE_COMPONENTS[a.type as string];
    if (!componentBytes || !components) refuse('damaged', `Accessor ${i} has an unknown data type: the file is damaged.`);
    const element = componentBytes * components;
    if (a.bufferView !== undefined) {
      const view = views[count(a.bufferView, `Accessor ${i}'s buffer view`)];
      if (!view) refuse('damaged', `Accessor ${i} refers to a buffer view the file does not have.`);
      const offset = optionalCount(a.byteOffset, `Accessor ${i}'s offset`);
      const stride = view.stride ?? element;
      const needed = items === 0 ? 0 : offset + stride * (items - 1) + element;
      if (needed > view.byteLength)
        refuse(
          'bad_sizes',
          `Accessor ${i} claims ${n(items)} items (${n(needed)} bytes) but its buffer view holds ${n(view.byteLength)}.`,
        );
    }
    const sparse = a.sparse as Json | undefined;
    if (sparse) {
      const sparseCount = count(sparse.count, `Accessor ${i}'s sparse count`);
      for (const [part, bytes] of [
        ['indices', COMPONENT_BYTES[(sparse.indices as Json | undefined)?.componentType as number] ?? 0],
        ['values', element],
      ] as const) {
        const ref = sparse[part] as Json | undefined;
        const view = ref ? views[count(ref.bufferView, `Accessor ${i}'s sparse ${part}`)] : undefined;
        if (!view || bytes === 0) refuse('damaged', `Accessor ${i}'s sparse ${part} are damaged.`);
        const needed = optionalCount(ref!.byteOffset, `Accessor ${i}'s sparse offset`) + sparseCount * bytes;
        if (needed > view!.byteLength) refuse('bad_sizes', `Accessor ${i}'s sparse ${part} claim more data than the file holds.`);
      }
    }
    return items;
  });

  const meshes = list(json, 'meshes');
  let vertices = 0;
  for (const [i, mesh] of meshes.entries()) {
    for (const primitive of list(mesh, 'primitives')) {
      const attributes = (primitive.attributes ?? {}) as Json;
      const position = attributes.POSITION;
      if (position === undefined) continue;
      const items = accessorCounts[count(position, `Mesh ${i}'s positions`)];
      if (items === undefined) refuse('damaged', `Mesh ${i} refers to an accessor the file does not have.`);
      vertices += items;
    }
  }
  const nodes = list(json, 'nodes').length;
  const materials = list(json, 'materials').length;
  const textures = list(json, 'textures').length;
  const images = list(json, 'images');
  const caps: [number, number, string][] = [
    [vertices, MODEL_LIMITS.maxVertices, 'vertices'],
    [meshes.length, MODEL_LIMITS.maxMeshes, 'meshes'],
    [nodes, MODEL_LIMITS.maxNodes, 'nodes'],
    [materials, MODEL_LIMITS.maxMaterials, 'materials'],
    [textures, MODEL_LIMITS.maxTextures, 'textures'],
    [images.length, MODEL_LIMITS.maxImages, 'images'],
  ];
  for (const [has, most, what] of caps)
    if (has > most)
      refuse(
        'too_complex',
        `The model has ${n(has)} ${what}; the most Parlour takes is ${n(most)}. Simplify it and export again.`,
      );

  // The bytes of each image, to read its size from its header (a few bytes of each; nothing decoded).
  const imageBytes = images.map((image, i): Buffer | null => {
    const uri = checkUri(image.uri, `Image ${i}`);
    if (uri !== null) {
      const comma = uri.indexOf(',');
      return /;base64,/i.test(uri.slice(0, comma + 1))
        ? Buffer.from(uri.slice(comma + 1, comma + 1 + 64 * 1024), 'base64')
        : null;
    }
    if (image.bufferView === undefined) return refuse('damaged', `Image ${i} has no data in the file.`);
    const view = views[count(image.bufferView, `Image ${i}'s buffer view`)];
    if (!view) return refuse('damaged', `Image ${i} refers to a buffer view the file does not have.`);
    if (container === 'glb' && view.buffer === 0 && bin) return bin.subarray(view.offset, view.offset + view.byteLength);
    const uriOfBuffer = buffers[view.buffer]?.uri as string;
    const comma = uriOfBuffer.indexOf(',');
    // Decode just enough of the buffer to reach the image's header.
    const startChar = comma + 1 + Math.floor(view.offset / 3) * 4;
    const chunk = Buffer.from(uriOfBuffer.slice(startChar, startChar + 64 * 1024), 'base64');
    return chunk.subarray(view.offset % 3);
  });

  return {
    vertices,
    meshes: meshes.length,
    nodes,
    materials,
    textures,
    extensions: [...new Set(extensionsUsed)].sort(),
    imageBytes,
  };
}

/** Each texture's size from its header; refuses one over the pixel limit or one that is no picture. */
async function checkImages(images: (Buffer | null)[]): Promise<void> {
  for (const [i, bytes] of images.entries()) {
    if (!bytes || bytes.length === 0) refuse('damaged', `Image ${i} cannot be read: the file is damaged.`);
    let width = 0;
    let height = 0;
    try {
      // A header read: sharp does not decode pixels for metadata.
      const meta = await sharp(bytes!, { limitInputPixels: false }).metadata();
      width = meta.width ?? 0;
      height = meta.height ?? 0;
    } catch {
      refuse('damaged', `Image ${i} is not a picture Parlour can read (PNG, JPEG or WebP).`);
    }
    if (width * height > MODEL_LIMITS.maxTexturePixels)
      refuse(
        'texture_too_large',
        `Image ${i} is ${n(width)} × ${n(height)} px (${Math.round((width * height) / 1e5) / 10} megapixels); the most is ${MODEL_LIMITS.maxTexturePixels / 1e6} megapixels.`,
      );
  }
}

/** The bounded first look at an upload: throws ModelProblem with the reason, or answers the counts. */
export async function checkModelFile(buf: Buffer): Promise<ModelHeader> {
  if (buf.length > MODEL_LIMITS.maxFileBytes)
    refuse('too_large', `The model is larger than ${mb(MODEL_LIMITS.maxFileBytes)}.`, 413);
  const { container, jsonText, bin } = splitContainer(buf);
  const json = parseJson(jsonText);
  const { imageBytes, ...counts } = checkDescription(json, container, bin);
  await checkImages(imageBytes);
  return { container, ...counts };
}
