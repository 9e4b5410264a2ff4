// Procedural pictures the project draws itself: demo finishes, benchmark photos and test images.
// Deterministic (seeded), so the same call gives the same bytes and the same content hash.
import sharp from 'sharp';
import { crc32, constants as zlibConstants, deflateRawSync } from 'node:zlib';

export interface RawImage {
  data: Buffer;
  width: number;
  height: number;
  channels: 3;
}

/** A small seeded pseudo-random generator (mulberry32), enough for textures. */
export function seededRandom(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/**
 * Value noise that wraps around: `cells` lattice cells across the image in each direction, so the
 * noise of the right edge continues into the left edge. Returns a sampler over 0…1 coordinates.
 */
function periodicNoise(cellsX: number, cellsY: number, seed: number): (u: number, v: number) => number {
  const rand = seededRandom(seed);
  const lattice = Float32Array.from({ length: cellsX * cellsY }, () => rand());
  const at = (i: number, j: number) => lattice[(((j % cellsY) + cellsY) % cellsY) * cellsX + (((i % cellsX) + cellsX) % cellsX)];
  const ease = (t: number) => t * t * (3 - 2 * t);
  return (u, v) => {
    const x = u * cellsX;
    const y = v * cellsY;
    const i = Math.floor(x);
    const j = Math.floor(y);
    const fx = ease(x - i);
    const fy = ease(y - j);
    const top = at(i, j) + (at(i + 1, j) - at(i, j)) * fx;
    const bottom = at(i, j + 1) + (at(i + 1, j + 1) - at(i, j + 1)) * fx;
    return top + (bottom - top) * fy;
  };
}

function fill(width: number, height: number, colourAt: (x: number, y: number) => [number, number, number]): RawImage {
  const data = Buffer.alloc(width * height * 3);
  for (let y = 0; y < height; y++) {
    for (let x = 0; x < width; x++) {
      const [r, g, b] = colourAt(x, y);
      const i = (y * width + x) * 3;
      data[i] = r;
      data[i + 1] = g;
      data[i + 2] = b;
    }
  }
  return { data, width, height, channels: 3 };
}

const clampByte = (v: number) => Math.max(0, Math.min(255, Math.round(v)));
const shade = (rgb: [number, number, number], k: number): [number, number, number] => [
  clampByte(rgb[0] * k),
  clampByte(rgb[1] * k),
  clampByte(rgb[2] * k),
];

/**
 * Oak floor boards running down the picture: `boards` boards across, each with its own tone, a
 * wavy grain and one end joint, staggered. Repeats exactly across and down.
 */
export function oakBoards(width = 768, height = 1536, boards = 4, seed = 7): RawImage {
  const grain = periodicNoise(boards * 3, 6, seed);
  const fine = periodicNoise(boards * 24, 48, seed + 1);
  const rand = seededRandom(seed + 2);
  const tones = Array.from({ length: boards }, () => 0.86 + rand() * 0.24);
  const joints = Array.from({ length: boards }, (_, i) => (i * 0.37 + rand() * 0.2) % 1);
  const boardPx = width / boards;
  const gapPx = Math.max(1, Math.round(width / 400));
  const base: [number, number, number] = [176, 136, 92];
  return fill(width, height, (x, y) => {
    const board = Math.floor(x / boardPx);
    const inBoard = x - board * boardPx;
    const v = y / height;
    const jointDistance = Math.abs(((v - joints[board] + 1.5) % 1) - 0.5) * height;
    if (inBoard < gapPx || jointDistance < gapPx * 0.75) return shade(base, 0.45);
    const u = x / width;
    const wobble = grain(u, v) * 7;
    const rings = 0.5 + 0.5 * Math.sin((inBoard / boardPx) * 38 + wobble + board * 1.7);
    const k = tones[board] * (0.88 + 0.12 * rings) * (0.94 + 0.1 * fine(u, v));
    return shade(base, k);
  });
}

/** A grey stone tile with grout split across its edges (half a joint each side), so it repeats. */
export function greyStoneTile(size = 1024, groutFraction = 0.006, seed = 11): RawImage {
  const cloud = periodicNoise(5, 5, seed);
  const speck = periodicNoise(90, 90, seed + 1);
  const vein = periodicNoise(3, 3, seed + 2);
  const halfGrout = Math.max(1, Math.round(size * groutFraction));
  return fill(size, size, (x, y) => {
    if (x < halfGrout || y < halfGrout || x >= size - halfGrout || y >= size - halfGrout) return [196, 192, 184];
    const u = x / size;
    const v = y / size;
    const veinLine = Math.abs(Math.sin((u * 2 + v * 1.2 + vein(u, v) * 1.5) * Math.PI * 2));
    const k = 0.82 + 0.16 * cloud(u, v) + 0.07 * speck(u, v) - (veinLine < 0.05 ? 0.08 : 0);
    return shade([150, 150, 146], k);
  });
}

/** Linen: fine warp and weft threads with slubs, woven over and under. Repeats exactly. */
export function linenWeave(size = 1024, threads = 96, seed = 23): RawImage {
  const slubX = periodicNoise(threads, 8, seed);
  const slubY = periodicNoise(8, threads, seed + 1);
  const base: [number, number, number] = [214, 203, 184];
  return fill(size, size, (x, y) => {
    const u = x / size;
    const v = y / size;
    const tx = (u * threads) % 1;
    const ty = (v * threads) % 1;
    const over = (Math.floor(u * threads) + Math.floor(v * threads)) % 2 === 0;
    const warp = 0.5 + 0.5 * Math.cos((tx - 0.5) * Math.PI * 2);
    const weft = 0.5 + 0.5 * Math.cos((ty - 0.5) * Math.PI * 2);
    const thread = over ? warp * (0.9 + 0.2 * slubX(u, v)) : weft * (0.9 + 0.2 * slubY(u, v));
    return shade(base, 0.8 + 0.2 * thread);
  });
}

/** A small wallpaper pattern drawn as SVG: sprigs on a warm ground, in a half-drop repeat. */
export async function sprigWallpaper(size = 1024): Promise<RawImage> {
  const cell = size / 4;
  const sprig = (cx: number, cy: number) => `
    <g transform="translate(${cx} ${cy})">
      <path d="M0 ${cell * 0.22} C ${cell * 0.04} 0, -${cell * 0.03} -${cell * 0.1}, 0 -${cell * 0.22}" stroke="#6f7d5c" stroke-width="${cell * 0.025}" fill="none"/>
      <ellipse cx="-${cell * 0.07}" cy="-${cell * 0.02}" rx="${cell * 0.07}" ry="${cell * 0.03}" transform="rotate(-35 -${cell * 0.07} -${cell * 0.02})" fill="#7f8e69"/>
      <ellipse cx="${cell * 0.07}" cy="${cell * 0.07}" rx="${cell * 0.07}" ry="${cell * 0.03}" transform="rotate(30 ${cell * 0.07} ${cell * 0.07})" fill="#8d9b76"/>
      <circle cx="0" cy="-${cell * 0.24}" r="${cell * 0.035}" fill="#c9835f"/>
    </g>`;
  const motifs: string[] = [];
  for (let i = -1; i <= 4; i++) {
    for (let j = -1; j <= 4; j++) {
      const drop = i % 2 === 0 ? 0 : cell / 2;
      motifs.push(sprig(i * cell + cell / 2, j * cell + cell / 2 + drop));
    }
  }
  const svg = `<svg xmlns="http://www.w3.org/2000/svg" width="${size}" height="${size}"><rect width="100%" height="100%" fill="#efe6d2"/>${motifs.join('')}</svg>`;
  const { data, info } = await sharp(Buffer.from(svg))
    .flatten({ background: '#efe6d2' })
    .removeAlpha()
    .raw()
    .toBuffer({ resolveWithObject: true });
  return { data, width: info.width, height: info.height, channels: 3 };
}

/** A checkerboard of `squares` × `squares`, starting dark at the top left. */
export function checkerboard(sizePx: number, squares: number): RawImage {
  const squarePx = sizePx / squares;
  return fill(sizePx, sizePx, (x, y) =>
    (Math.floor(x / squarePx) + Math.floor(y / squarePx)) % 2 === 0 ? [30, 30, 30] : [225, 225, 225],
  );
}

/**
 * Something like a phone photo of a surface: soft light falloff, a colour drift and texture noise,
 * which does not repeat by itself (so the edge blending has work to do).
 */
export function photoLike(width: number, height: number, seed = 3): RawImage {
  const rand = seededRandom(seed);
  const blotch = periodicNoise(9, 7, seed);
  return fill(width, height, (x, y) => {
    const u = x / width;
    const v = y / height;
    const light = 0.75 + 0.25 * (1 - ((u - 0.35) ** 2 + (v - 0.3) ** 2));
    const k = light * (0.85 + 0.2 * blotch(u, v)) + (rand() - 0.5) * 0.08;
    return [clampByte(168 * k + 30 * u), clampByte(140 * k), clampByte(112 * k + 20 * v)];
  });
}

export const rawToSharp = (img: RawImage) =>
  sharp(img.data, { raw: { width: img.width, height: img.height, channels: img.channels } });
export const rawToJpeg = (img: RawImage, quality = 90) => rawToSharp(img).jpeg({ quality }).toBuffer();
export const rawToPng = (img: RawImage) => rawToSharp(img).png().toBuffer();

/**
 * A valid greyscale PNG of `width` × `height` zero pixels, built without ever holding the pixels:
 * one block of rows is deflated with a full flush (so its bytes stand alone) and repeated. A few
 * hundred kilobytes can claim gigabytes: the shape of a decompression bomb. `height` must be a
 * multiple of `rowsPerBlock`.
 */
export function zeroPng(width: number, height: number, bitDepth: 1 | 8 = 1, rowsPerBlock = 100): Buffer {
  if (height % rowsPerBlock !== 0) throw new RangeError('height must be a multiple of rowsPerBlock');
  const rowBytes = 1 + Math.ceil((width * bitDepth) / 8); // filter byte + packed samples
  const block = deflateRawSync(Buffer.alloc(rowBytes * rowsPerBlock), { finishFlush: zlibConstants.Z_FULL_FLUSH });
  const last = deflateRawSync(Buffer.alloc(0));
  const total = rowBytes * height;
  // Adler-32 of n zero bytes: a stays 1, b adds a once per byte.
  const adler = Buffer.alloc(4);
  adler.writeUInt32BE((((total % 65521) << 16) | 1) >>> 0);
  const idat = Buffer.concat([
    Buffer.from([0x78, 0x9c]),
    ...Array.from({ length: height / rowsPerBlock }, () => block),
    last,
    adler,
  ]);
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(width, 0);
  ihdr.writeUInt32BE(height, 4);
  ihdr[8] = bitDepth;
  ihdr[9] = 0; // greyscale
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    pngChunk('IHDR', ihdr),
    pngChunk('IDAT', idat),
    pngChunk('IEND', Buffer.alloc(0)),
  ]);
}

function pngChunk(type: string, data: Buffer): Buffer {
  const length = Buffer.alloc(4);
  length.writeUInt32BE(data.length);
  const body = Buffer.concat([Buffer.from(type, 'latin1'), data]);
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(body));
  return Buffer.concat([length, body, crc]);
}
