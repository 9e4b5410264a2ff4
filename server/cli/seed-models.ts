// The demo studio's two piece models, made by the project itself from its own forms with the glTF
// library (a sofa on legs without the demo plan's plinth, a reading chair), normalised as any upload
// is, stored and listed ready, so the demo flat's sofa and armchair show them in 3D.
import type { Db } from '../db/database';
import type { FileStorage } from '../services/storage/storage';
import { pieceSchema, type Piece } from '../../shared/schemas/option';
import { formModelDocument } from '../services/gltf/form-model';
import { normaliseModel } from '../services/gltf/normalise-model';
import { toGlb } from '../services/gltf/test-models';
import { derivedModelKey } from '../features/files/file-keys';
import { readyColumns } from '../features/models/models.service';

interface DemoModel {
  name: string;
  supplier: string;
  price: number;
  piece: Piece;
  colours: { main: string; accent: string };
}

const DEMO_MODELS: DemoModel[] = [
  {
    name: 'Weir sofa, three seats',
    supplier: 'Made by Parlour (demo)',
    price: 1450,
    piece: pieceSchema.parse({
      id: 'm',
      name: 'Weir sofa',
      x: 0,
      y: 0,
      width: 2100,
      depth: 900,
      height: 850,
      status: 'new',
      kind: 'sofa',
      settings: { base: 'legs', arms: 'both' },
    }),
    colours: { main: '#a89f91', accent: '#5b4636' },
  },
  {
    name: 'Lantern reading chair',
    supplier: 'Made by Parlour (demo)',
    price: 640,
    piece: pieceSchema.parse({
      id: 'm',
      name: 'Lantern reading chair',
      x: 0,
      y: 0,
      width: 850,
      depth: 850,
      height: 800,
      status: 'new',
      kind: 'armchair',
      settings: { base: 'legs', arms: 'both' },
    }),
    colours: { main: '#7d8a78', accent: '#6b5442' },
  },
];

/** Makes the demo models for `studioId`; answers their ids by the piece they were made for (sofa, armchair). */
export async function seedDemoModels(
  db: Db,
  studioId: string,
  storage: FileStorage,
): Promise<Record<'sofa' | 'armchair', string>> {
  const ids: string[] = [];
  for (const demo of DEMO_MODELS) {
    const source = await toGlb(formModelDocument(demo.piece, demo.colours));
    const model = await normaliseModel(source);
    const key = derivedModelKey(model.glb);
    await storage.put(key, model.glb);
    const row = await db
      .insertInto('piece_models')
      .values({
        studio_id: studioId,
        name: demo.name,
        supplier: demo.supplier,
        price: demo.price,
        kind: demo.piece.kind ?? null,
        status: 'ready',
        file_name: `${demo.piece.kind}.glb`,
        source_bytes: source.length,
        ...readyColumns(model, key),
      })
      .returning('id')
      .executeTakeFirstOrThrow();
    ids.push(row.id);
  }
  return { sofa: ids[0], armchair: ids[1] };
}
