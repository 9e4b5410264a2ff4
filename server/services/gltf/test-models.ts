// Small glTF models built in code with the glTF library, for tests and the demo: a chair of boxes
// with a texture, a sofa authored in centimetres, a model facing −X, and hostile variants made by
// editing a sound file's description or bytes. Every size is in metres (glTF), Y up.
import { Document, NodeIO, type Material, type Mesh, type Texture } from '@gltf-transform/core';
import sharp from 'sharp';

/** One box as a mesh primitive: 24 vertices (flat faces), 12 triangles, uv 0–1 on every face. */
export function addBox(
  doc: Document,
  mesh: Mesh,
  material: Material,
  size: [number, number, number],
  centre: [number, number, number],
): void {
  const [sx, sy, sz] = size.map((v) => v / 2);
  const [cx, cy, cz] = centre;
  const positions: number[] = [];
  const normals: number[] = [];
  const uvs: number[] = [];
  const indices: number[] = [];
  const faces: [number[], number[], number[]][] = [
    // normal, u axis, v axis
    [
      [1, 0, 0],
      [0, 0, -1],
      [0, 1, 0],
    ],
    [
      [-1, 0, 0],
      [0, 0, 1],
      [0, 1, 0],
    ],
    [
      [0, 1, 0],
      [1, 0, 0],
      [0, 0, -1],
    ],
    [
      [0, -1, 0],
      [1, 0, 0],
      [0, 0, 1],
    ],
    [
      [0, 0, 1],
      [1, 0, 0],
      [0, 1, 0],
    ],
    [
      [0, 0, -1],
      [-1, 0, 0],
      [0, 1, 0],
    ],
  ];
  for (const [nrm, u, v] of faces) {
    const base = positions.length / 3;
    for (const [a, b] of [
      [-1, -1],
      [1, -1],
      [1, 1],
      [-1, 1],
    ]) {
      const p = [0, 1, 2].map((k) => nrm[k] + a * u[k] + b * v[k]);
      positions.push(cx + p[0] * sx, cy + p[1] * sy, cz + p[2] * sz);
      normals.push(...nrm);
      uvs.push((a + 1) / 2, (1 - b) / 2);
    }
    indices.push(base, base + 1, base + 2, base, base + 2, base + 3);
  }
  const buffer = doc.getRoot().listBuffers()[0] ?? doc.createBuffer();
  const accessor = (type: 'VEC3' | 'VEC2' | 'SCALAR', array: Float32Array | Uint16Array) =>
    doc.createAccessor().setType(type).setArray(array).setBuffer(buffer);
  mesh.addPrimitive(
    doc
      .createPrimitive()
      .setMaterial(material)
      .setAttribute('POSITION', accessor('VEC3', new Float32Array(positions)))
      .setAttribute('NORMAL', accessor('VEC3', new Float32Array(normals)))
      .setAttribute('TEXCOORD_0', accessor('VEC2', new Float32Array(uvs)))
      .setIndices(accessor('SCALAR', new Uint16Array(indices))),
  );
}

/** A smooth ellipsoid of `segments` × `segments` quads (2 × segments² triangles): a dense cushion. */
export function addEllipsoid(
  doc: Document,
  mesh: Mesh,
  material: Material,
  radii: [number, number, number],
  centre: [number, number, number],
  segments: number,
): void {
  const positions: number[] = [];
  const uvs: number[] = [];
  const indices: number[] = [];
  for (let i = 0; i <= segments; i++) {
    const theta = (i / segments) * Math.PI;
    for (let j = 0; j <= segments; j++) {
      const phi = (j / segments) * 2 * Math.PI;
      positions.push(
        centre[0] + radii[0] * Math.sin(theta) * Math.cos(phi),
        centre[1] + radii[1] * Math.cos(theta),
        centre[2] + radii[2] * Math.sin(theta) * Math.sin(phi),
      );
      uvs.push(j / segments, i / segments);
    }
  }
  const row = segments + 1;
  for (let i = 0; i < segments; i++)
    for (let j = 0; j < segments; j++) {
      const a = i * row + j;
      indices.push(a, a + row, a + 1, a + 1, a + row, a + row + 1);
    }
  const buffer = doc.getRoot().listBuffers()[0] ?? doc.createBuffer();
  mesh.addPrimitive(
    doc
      .createPrimitive()
      .setMaterial(material)
      .setAttribute('POSITION', doc.createAccessor().setType('VEC3').setArray(new Float32Array(positions)).setBuffer(buffer))
      .setAttribute('TEXCOORD_0', doc.createAccessor().setType('VEC2').setArray(new Float32Array(uvs)).setBuffer(buffer))
      .setIndices(doc.createAccessor().setType('SCALAR').setArray(new Uint32Array(indices)).setBuffer(buffer)),
  );
}

/** A woven-looking swatch: a two-colour check of 8 px squares (a plain colour would be pruned as one). */
async function swatchPng(px = 64): Promise<Uint8Array> {
  const pixels = Buffer.alloc(px * px * 3);
  for (let y = 0; y < px; y++)
    for (let x = 0; x < px; x++) {
      const dark = ((x >> 3) + (y >> 3)) % 2 === 0;
      pixels.set(dark ? [120, 86, 60] : [176, 140, 104], (y * px + x) * 3);
    }
  return new Uint8Array(
    await sharp(pixels, { raw: { width: px, height: px, channels: 3 } })
      .png()
      .toBuffer(),
  );
}

function texture(doc: Document, png: Uint8Array): Texture {
  return doc.createTexture('weave').setImage(png).setMimeType('image/png');
}

/**
 * A dining chair of boxes (and, with `cushionSegments`, a dense cushion), 0.45 m wide (X), 0.5 m deep (Z), 0.9 m high (Y), standing on y = 0, its
 * seat facing +Z; the seat wears a small PNG texture. `scale` multiplies every length (100: authored
 * in centimetres); `facing` 'x-' turns it so its front faces −X.
 */
export async function chairDocument({
  scale = 1,
  facing = 'z+' as 'z+' | 'x-',
  texturePx = 64,
  cushionSegments = 0,
} = {}): Promise<Document> {
  const doc = new Document();
  doc.createBuffer();
  const wood = doc.createMaterial('Frame').setBaseColorFactor([0.45, 0.3, 0.2, 1]).setRoughnessFactor(0.7);
  const seat = doc
    .createMaterial('Seat')
    .setBaseColorFactor([1, 1, 1, 1])
    .setBaseColorTexture(texture(doc, await swatchPng(texturePx)));
  const mesh = doc.createMesh('chair');
  const s = scale;
  const legs: [number, number][] = [
    [-0.2, -0.22],
    [0.2, -0.22],
    [-0.2, 0.22],
    [0.2, 0.22],
  ];
  for (const [x, z] of legs) addBox(doc, mesh, wood, [0.04 * s, 0.43 * s, 0.04 * s], [x * s, 0.215 * s, z * s]);
  addBox(doc, mesh, seat, [0.45 * s, 0.05 * s, 0.5 * s], [0, 0.455 * s, 0]);
  addBox(doc, mesh, wood, [0.45 * s, 0.42 * s, 0.04 * s], [0, 0.69 * s, -0.23 * s]);
  // A dense seat cushion inside the chair's bounds, to be simplified.
  if (cushionSegments > 0) addEllipsoid(doc, mesh, seat, [0.2 * s, 0.04 * s, 0.22 * s], [0, 0.5 * s, 0], cushionSegments);
  const node = doc.createNode('chair').setMesh(mesh);
  // Turning a +Z front to −X is a quarter turn of −90° about Y.
  if (facing === 'x-') node.setRotation([0, -Math.SQRT1_2, 0, Math.SQRT1_2]);
  doc.createScene('chair').addChild(node);
  return doc;
}

/** A three-seat sofa authored in centimetres: 210 × 90 × 85 cm read as metres (a 210 m sofa). */
export async function centimetreSofaDocument(): Promise<Document> {
  const doc = new Document();
  doc.createBuffer();
  const cloth = doc.createMaterial('Upholstery').setBaseColorFactor([0.5, 0.55, 0.6, 1]);
  const mesh = doc.createMesh('sofa');
  addBox(doc, mesh, cloth, [210, 42, 90], [0, 21, 0]);
  addBox(doc, mesh, cloth, [210, 43, 20], [0, 63.5, -35]);
  doc.createScene('sofa').addChild(doc.createNode('sofa').setMesh(mesh));
  return doc;
}

/** A model with `boxes` boxes in one mesh: 24 vertices and 12 triangles each. */
export function manyBoxesDocument(boxes: number): Document {
  const doc = new Document();
  doc.createBuffer();
  const m = doc.createMaterial('Grey');
  const mesh = doc.createMesh('boxes');
  const side = Math.ceil(Math.sqrt(boxes));
  for (let i = 0; i < boxes; i++)
    addBox(doc, mesh, m, [0.01, 0.01, 0.01], [(i % side) * 0.02, 0.005, Math.floor(i / side) * 0.02]);
  doc.createScene().addChild(doc.createNode().setMesh(mesh));
  return doc;
}

export const modelIo = () => new NodeIO();

/** The document as a .glb's bytes. */
export async function toGlb(doc: Document): Promise<Buffer> {
  return Buffer.from(await modelIo().writeBinary(doc));
}

/** The document as one .gltf text with every buffer and image embedded as a data URI. */
export async function toEmbeddedGltf(doc: Document): Promise<Buffer> {
  const io = modelIo();
  const glb = await io.writeBinary(doc);
  const { json, resources } = await io.binaryToJSON(glb);
  const bin = resources['@glb.bin'] ?? Object.values(resources)[0];
  json.buffers = (json.buffers ?? []).map((b) => ({
    byteLength: b.byteLength,
    uri: `data:application/octet-stream;base64,${Buffer.from(bin).toString('base64')}`,
  }));
  return Buffer.from(JSON.stringify(json));
}

type Json = Record<string, unknown>;

/** A .glb rebuilt with its JSON edited by `edit` (the binary chunk kept as it is). */
export function editGlbJson(glb: Buffer, edit: (json: Json) => void): Buffer {
  const jsonLength = glb.readUInt32LE(12);
  const json = JSON.parse(glb.subarray(20, 20 + jsonLength).toString('utf8')) as Json;
  edit(json);
  let text = Buffer.from(JSON.stringify(json));
  const pad = (4 - (text.length % 4)) % 4;
  text = Buffer.concat([text, Buffer.alloc(pad, 0x20)]);
  const rest = glb.subarray(20 + jsonLength);
  const header = Buffer.alloc(20);
  header.writeUInt32LE(0x46546c67, 0);
  header.writeUInt32LE(2, 4);
  header.writeUInt32LE(20 + text.length + rest.length, 8);
  header.writeUInt32LE(text.length, 12);
  header.writeUInt32LE(0x4e4f534a, 16);
  return Buffer.concat([header, text, rest]);
}

/** A PNG header (signature and IHDR) claiming `width` × `height` pixels, with one empty image chunk. */
export function pngHeaderOnly(width: number, height: number): Buffer {
  const crcTable = Array.from({ length: 256 }, (_, k) => {
    let c = k;
    for (let i = 0; i < 8; i++) c = c & 1 ? 0xedb88320 ^ (c >>> 1) : c >>> 1;
    return c >>> 0;
  });
  const crc = (bytes: Buffer) => {
    let c = 0xffffffff;
    for (const b of bytes) c = crcTable[(c ^ b) & 0xff] ^ (c >>> 8);
    return (c ^ 0xffffffff) >>> 0;
  };
  const chunk = (type: string, data: Buffer) => {
    const body = Buffer.concat([Buffer.from(type, 'ascii'), data]);
    const out = Buffer.alloc(8 + data.length + 4);
    out.writeUInt32BE(data.length, 0);
    body.copy(out, 4);
    out.writeUInt32BE(crc(body), 8 + data.length);
    return out;
  };
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(width, 0);
  ihdr.writeUInt32BE(height, 4);
  ihdr[8] = 8; // bit depth
  ihdr[9] = 2; // truecolour
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    chunk('IHDR', ihdr),
    chunk('IDAT', Buffer.alloc(0)),
    chunk('IEND', Buffer.alloc(0)),
  ]);
}

/** The chair with its seat texture replaced by a PNG header claiming `width` × `height`. */
export async function chairWithHugeTexture(width: number, height: number): Promise<Buffer> {
  const doc = await chairDocument();
  const tex = doc.getRoot().listTextures()[0];
  tex.setImage(new Uint8Array(pngHeaderOnly(width, height)));
  return toGlb(doc);
}
