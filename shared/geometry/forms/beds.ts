// Beds and cots.
import type { PieceSettings } from '../../schemas/piece-kind';
import { MATTRESS_TOP, fitDefault } from './ergonomics';
import { boxPart, clamp, fourLegs, panelPart, roundedPart, type FormBox, type Part } from './parts';

const LINEN = '#f3f0ea';
const PILLOW = '#fbfaf7';
/** Mattress thickness on a bed frame, mm (common practice, 180–250). */
const MATTRESS_MM = 220;
/** A standard pillow is about this wide, mm (common practice: 50 × 75 cm). */
const PILLOW_WIDTH_MM = 700;

/** A bed: legs or a divan base, frame, mattress, pillows at the head, a headboard against the wall (−y), a footboard if asked. */
export function bedForm(box: FormBox, settings: PieceSettings): Part[] {
  const { width: w, depth: d, height: h } = box;
  const head = clamp(d * 0.03, 30, 80);
  const foot = settings.footboard ? clamp(d * 0.02, 20, 50) : 0;
  const mattressTop = Math.min(fitDefault(MATTRESS_TOP, h, 0.9), h);
  const mattressBottom = mattressTop - Math.min(MATTRESS_MM, mattressTop * 0.45);
  const legs = settings.base === 'plinth' ? 0 : clamp(mattressBottom * 0.4, 0, 150);
  const headTop = clamp(settings.headboardHeight ?? h, mattressTop, h);
  const parts: Part[] = [];
  if (legs > 0) parts.push(...fourLegs(-w / 2, w / 2, -d / 2 + head, d / 2 - foot, legs, 45, 20, 0.8));
  parts.push(
    boxPart(-w / 2, w / 2, -d / 2 + head, d / 2 - foot, legs, mattressBottom),
    roundedPart(-w / 2, w / 2, -d / 2, -d / 2 + head, 0, headTop, Math.min(15, head / 2), { role: 'back' }),
    roundedPart(-w / 2 + 20, w / 2 - 20, -d / 2 + head, d / 2 - foot - 10, mattressBottom, mattressTop, 40, { colour: LINEN }),
  );
  // The duvet's turned-down fold over the lower two thirds, in the main finish like a throw.
  parts.push(
    roundedPart(
      -w / 2 + 10,
      w / 2 - 10,
      -d / 2 + head + (d - head) * 0.33,
      d / 2 - foot,
      mattressTop,
      Math.min(h, mattressTop + 25),
      30,
      { role: 'front' },
    ),
  );
  const pillows = Math.max(1, Math.round((w - 100) / PILLOW_WIDTH_MM));
  const span = (w - 120) / pillows;
  const pillowTop = Math.min(h, mattressTop + 120);
  if (pillowTop > mattressTop + 20) {
    for (let i = 0; i < pillows; i++) {
      const x0 = -w / 2 + 60 + i * span + 15;
      parts.push(
        roundedPart(
          x0,
          x0 + span - 30,
          -d / 2 + head + 40,
          -d / 2 + head + 40 + Math.min(450, d * 0.2),
          mattressTop,
          pillowTop,
          60,
          { colour: PILLOW, role: 'back' },
        ),
      );
    }
  }
  if (foot > 0)
    parts.push(roundedPart(-w / 2, w / 2, d / 2 - foot, d / 2, 0, Math.min(h, mattressTop + 100), Math.min(10, foot / 2)));
  return parts;
}

/** A cot: four posts, slatted sides and ends, a mattress raised inside. */
export function cotForm(box: FormBox): Part[] {
  const { width: w, depth: d, height: h } = box;
  const post = clamp(Math.min(w, d) * 0.06, 25, 50);
  const rail = 30;
  const base = clamp(h * 0.35, 100, 450);
  const parts: Part[] = [
    ...fourLegs(-w / 2, w / 2, -d / 2, d / 2, h, post, 0, 1, { slot: 'main' }),
    boxPart(-w / 2 + post, w / 2 - post, -d / 2 + post, d / 2 - post, base - 30, base, { slot: 'main' }),
    roundedPart(-w / 2 + post + 5, w / 2 - post - 5, -d / 2 + post + 5, d / 2 - post - 5, base, base + 100, 25, {
      colour: LINEN,
    }),
  ];
  // Top and bottom rails round all four sides, slats between them on the long sides.
  for (const z of [base - 30 - rail, h - rail]) {
    parts.push(panelPart(-w / 2 + post, w / 2 - post, -d / 2, -d / 2 + post / 2, z, z + rail, { slot: 'main' }));
    parts.push(panelPart(-w / 2 + post, w / 2 - post, d / 2 - post / 2, d / 2, z, z + rail, { slot: 'main', role: 'front' }));
    parts.push(panelPart(-w / 2, -w / 2 + post / 2, -d / 2 + post, d / 2 - post, z, z + rail, { slot: 'main' }));
    parts.push(panelPart(w / 2 - post / 2, w / 2, -d / 2 + post, d / 2 - post, z, z + rail, { slot: 'main' }));
  }
  const slats = Math.max(2, Math.floor((w - 2 * post) / 90));
  const step = (w - 2 * post) / slats;
  for (let i = 1; i < slats; i++) {
    const x = -w / 2 + post + i * step;
    const t = Math.min(20, post / 2);
    for (const y of [-d / 2 + post / 4, d / 2 - post / 4])
      parts.push(panelPart(x - t / 2, x + t / 2, y - t / 2, y + t / 2, base - 30, h - rail, { slot: 'accent' }));
  }
  return parts;
}
