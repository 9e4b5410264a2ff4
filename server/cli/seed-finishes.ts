// The demo studio's finish library: four photo finishes drawn by the project itself (no photos
// from anywhere else) and three paints, all with invented names.
import { resolve } from 'node:path';
import type { Db } from '../db/database';
import type { FileStorage } from '../services/storage/storage';
import { dataDirStorage } from '../services/storage/local-disk';
import { greyStoneTile, linenWeave, oakBoards, rawToPng, sprigWallpaper, type RawImage } from '../services/images/generate';
import type { NewFinish } from '../features/finishes/finishes.repository';
import { insertFinishRows } from '../features/finishes/finishes.repository';
import { runPhotoJob } from '../features/finishes/finishes.service';
import { uploadKey } from '../features/files/file-keys';
import type { FinishCategory } from '../../shared/schemas/finish';

/** The file store `npm start` serves from (DATA_DIR/files, DATA_DIR defaulting to ./data as in the config). */
export function demoFileStorage(): FileStorage {
  return dataDirStorage(resolve(process.env.DATA_DIR ?? 'data'));
}

interface DemoPhoto {
  name: string;
  category: FinishCategory;
  repeatWidthMm: number;
  repeatHeightMm: number;
  supplier: string;
  code: string;
  price: number;
  priceUnit: 'm2' | 'unit';
  draw: () => RawImage | Promise<RawImage>;
}

// Each drawing repeats exactly at its edges, so the whole picture is the crop and no blending is needed.
const PHOTOS: DemoPhoto[] = [
  // Four 180 mm boards across, 1440 mm long: a common engineered oak board size (common practice).
  {
    name: 'Oak boards, natural oil',
    category: 'wood',
    repeatWidthMm: 720,
    repeatHeightMm: 1440,
    supplier: 'Sample timber merchant',
    code: 'OAK-180',
    price: 58,
    priceUnit: 'm2',
    draw: () => oakBoards(),
  },
  {
    name: 'Grey stone tile',
    category: 'tile',
    repeatWidthMm: 600,
    repeatHeightMm: 600,
    supplier: 'Sample tile house',
    code: 'GST-600',
    price: 46,
    priceUnit: 'm2',
    draw: () => greyStoneTile(),
  },
  {
    name: 'Washed linen',
    category: 'fabric',
    repeatWidthMm: 100,
    repeatHeightMm: 100,
    supplier: 'Sample weaver',
    code: 'LIN-04',
    price: 32,
    priceUnit: 'm2',
    draw: () => linenWeave(),
  },
  // A 265 mm pattern repeat: half a 530 mm roll width, a common wallpaper roll (common practice); priced per roll.
  {
    name: 'Sprig wallpaper',
    category: 'wallpaper',
    repeatWidthMm: 265,
    repeatHeightMm: 265,
    supplier: 'Sample paper studio',
    code: 'SPR-12',
    price: 29,
    priceUnit: 'unit',
    draw: () => sprigWallpaper(),
  },
];

// Invented paints, priced per litre.
const PAINTS = [
  {
    name: 'Morning oat',
    colour_hex: '#e6dcc8',
    sheen: 'matt',
    price: 14.5,
    price_unit: 'litre',
    supplier: 'Sample paint mill',
    code: 'MO-01',
  },
  {
    name: 'Sage hall',
    colour_hex: '#a3ad94',
    sheen: 'eggshell',
    price: 16,
    price_unit: 'litre',
    supplier: 'Sample paint mill',
    code: 'SH-07',
  },
  {
    name: 'Deep harbour',
    colour_hex: '#2f4858',
    sheen: 'satin',
    price: 18.5,
    price_unit: 'litre',
    supplier: 'Sample paint mill',
    code: 'DH-12',
  },
] as const;

/** Adds the demo finishes to `studioId`, processing each drawing exactly as an upload is processed. */
export async function seedDemoFinishes(db: Db, studioId: string, storage: FileStorage): Promise<Record<string, string>> {
  const ids: Record<string, string> = {};
  const paints = await insertFinishRows(
    db,
    PAINTS.map((p): NewFinish => ({ studio_id: studioId, kind: 'paint', ...p })),
  );
  PAINTS.forEach((p, i) => (ids[p.name] = paints[i].id));
  for (const photo of PHOTOS) {
    const image = await photo.draw();
    const key = uploadKey('png');
    await storage.put(key, await rawToPng(image));
    const [row] = await insertFinishRows(db, [
      {
        studio_id: studioId,
        kind: 'photo',
        name: photo.name,
        category: photo.category,
        repeat_width_mm: photo.repeatWidthMm,
        repeat_height_mm: photo.repeatHeightMm,
        supplier: photo.supplier,
        code: photo.code,
        price: photo.price,
        price_unit: photo.priceUnit,
        crop: JSON.stringify({ x: 0, y: 0, width: 1, height: 1 }),
        edge_blend: 'none',
        status: 'processing',
        source_key: key,
        photo_width_px: image.width,
        photo_height_px: image.height,
        queued_at: new Date(),
      },
    ]);
    await runPhotoJob(db, storage, row.id);
    ids[photo.name] = row.id;
  }
  return ids;
}
