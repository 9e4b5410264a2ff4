// Holds every form's parts and meshes to the exact numbers they had before the mesh writer was made faster.
import { describe, expect, it } from 'vitest';
import { CATALOGUE } from '../../catalogue/catalogue';
import { KIND_SETTINGS, PIECE_KINDS, type PieceKind, type PieceSettings } from '../../schemas/piece-kind';
import type { MeshData } from '../scene';
import { formParts, type FormBox } from './index';
import { formMeshes, type FormMeshes } from './mesh';
import { seededRandom, SETTING_VALUES } from './form-test-cases';

// FNV-1a over bytes and strings: any changed bit of any number changes the digest.
class Digest {
  private h = 0x811c9dc5;
  bytes(view: ArrayBufferView): void {
    const b = new Uint8Array(view.buffer, view.byteOffset, view.byteLength);
    this.h = Math.imul(this.h ^ b.length, 0x01000193) >>> 0;
    for (let i = 0; i < b.length; i++) this.h = Math.imul(this.h ^ b[i]!, 0x01000193) >>> 0;
  }
  text(s: string): void {
    for (let i = 0; i < s.length; i++) this.h = Math.imul(this.h ^ s.charCodeAt(i), 0x01000193) >>> 0;
  }
  get value(): string {
    return this.h.toString(16).padStart(8, '0');
  }
}

function addMesh(d: Digest, mesh: MeshData): void {
  d.bytes(mesh.positions);
  d.bytes(mesh.normals);
  d.bytes(mesh.uvs);
  d.bytes(mesh.indices);
}

function addForm(d: Digest, form: FormMeshes): void {
  addMesh(d, form.main);
  addMesh(d, form.accent);
  addMesh(d, form.own);
  d.text(JSON.stringify(form.ownColours));
}

// The same seeded generator as the forms tests, so the sizes are fixed.
/** Catalogue sizes, every setting value on the first, and eight random boxes, for one kind. */
function cases(kind: PieceKind): { box: FormBox; settings: PieceSettings }[] {
  const own = CATALOGUE.filter((c) => c.kind === kind).map((e) => ({
    box: { width: e.width, depth: e.depth, height: e.height },
    settings: e.settings ?? {},
  }));
  const first = own[0]!;
  const variants = KIND_SETTINGS[kind].flatMap((key) =>
    SETTING_VALUES[key]!.map((v) => ({ box: first.box, settings: { ...first.settings, [key]: v } as PieceSettings })),
  );
  const next = seededRandom(1000 + PIECE_KINDS.indexOf(kind));
  const scaled = Array.from({ length: 8 }, () => ({
    box: {
      width: first.box.width * (0.3 + next() * 2.5),
      depth: first.box.depth * (0.3 + next() * 2.5),
      height: first.box.height * (0.3 + next() * 2.5),
    },
    settings: first.settings,
  }));
  return [...own, ...variants, ...scaled];
}

const PLACEMENTS = [
  { x: 0, y: 0, rotation: 0, elevation: 0 },
  { x: 1234.5, y: 678.25, rotation: 37, elevation: 0 },
  { x: 5000, y: 4000, rotation: 270, elevation: 1200 },
];

/** Digests taken from the forms as they were before the mesh writer sized its buffers in advance. */
const EXPECTED: Record<string, string> = {
  armchair: '8b09d285',
  bed: '91633992',
  'bedside-table': 'bdacacc9',
  bench: '9df4905b',
  bookcase: '0d4d079f',
  'chest-of-drawers': '6256cdc8',
  'coffee-table': 'e501821e',
  'corner-sofa': '3c000cf4',
  cot: 'a370b0bd',
  desk: '70f7af12',
  'dining-chair': '83b602ca',
  'dining-set': '85e7c319',
  'dining-table': '21e5c758',
  dishwasher: '2483fe7a',
  'floor-lamp': 'd807c050',
  'kitchen-base-unit': '5733f2ad',
  'kitchen-wall-unit': '19e98133',
  'media-unit': 'c9b1a0de',
  mirror: '24ce8442',
  'open-shelving': 'eb96e224',
  ottoman: 'f10e1423',
  'oven-housing': 'c915ab91',
  'pendant-light': '252bd169',
  picture: 'e8b6aba8',
  'plain-block': '1a2f2902',
  plant: 'd2f77e28',
  radiator: '5253ac15',
  rug: '46e06431',
  'side-table': 'dafe1fe0',
  sideboard: 'bbbd48ae',
  sofa: '6440b574',
  stool: '05fe428c',
  'table-lamp': 'd70bdda5',
  'wall-cabinet': 'de5d8125',
  'wall-shelf': '3b71cc40',
  wardrobe: '8bbca1d0',
};

describe('form meshes, number for number', () => {
  it.each(PIECE_KINDS)('%s: parts and placed meshes unchanged', (kind) => {
    const d = new Digest();
    for (const { box, settings } of cases(kind)) {
      const parts = formParts(kind, settings, box);
      for (const p of parts)
        d.text([p.shape, p.x, p.y, p.z, p.w, p.d, p.h, p.slot, p.role, p.radius, p.colour, p.taper].map(String).join(' '));
      for (const at of PLACEMENTS) addForm(d, formMeshes(parts, at));
    }
    expect(d.value).toBe(EXPECTED[kind]);
  });
});
