// Rugs, lights, mirrors and pictures, plants, radiators and the plain block.
import type { PieceSettings } from '../../schemas/piece-kind';
import { boxPart, clamp, discPart, legPart, panelPart, roundedPart, type FormBox, type Part } from './parts';

const SHADE = '#f1e9da';
const GLASS = '#c9d6da';
const LEAVES = ['#5d7a52', '#6e8c5f', '#4f6b47'];
const TRUNK = '#6b5140';
const MOUNT = '#f6f4ef';

/** A rug: one thin panel, round or with softly rounded corners. */
export function rugForm(box: FormBox, settings: PieceSettings): Part[] {
  const { width: w, depth: d, height: h } = box;
  if (settings.top === 'round') return [roundedPart(-w / 2, w / 2, -d / 2, d / 2, 0, h, Math.min(w, d) / 2)];
  return [panelPart(-w / 2, w / 2, -d / 2, d / 2, 0, h)];
}

/** A floor lamp: a weighted round foot, a slim pole and a drum shade at the top. */
export function floorLampForm(box: FormBox): Part[] {
  const { width: w, depth: d, height: h } = box;
  const size = Math.min(w, d);
  const foot = clamp(h * 0.02, 10, 40);
  const shadeH = clamp(h * 0.2, 60, 400);
  return [
    discPart(0, 0, size * 0.65, 0, foot, { slot: 'accent' }),
    legPart(0, 0, clamp(size * 0.05, 12, 30), foot, h - shadeH, 1),
    legPart(0, 0, size * 0.8, h - shadeH, h, 1.25, { colour: SHADE, role: 'top' }),
  ];
}

/** A table lamp: a rounded base, a short stem and a shade wider at its foot. */
export function tableLampForm(box: FormBox): Part[] {
  const { width: w, depth: d, height: h } = box;
  const size = Math.min(w, d);
  const baseH = h * 0.35;
  const shadeH = h * 0.4;
  return [
    legPart(0, 0, size * 0.4, 0, baseH, 1.3, { slot: 'main', role: 'body' }),
    legPart(0, 0, clamp(size * 0.06, 8, 25), baseH, h - shadeH, 1),
    legPart(0, 0, size * 0.78, h - shadeH, h, 1.28, { colour: SHADE, role: 'top' }),
  ];
}

/** A pendant light: a ceiling rose at the top, a cord, and a shade hanging from it (the elevation is its lowest point). */
export function pendantLightForm(box: FormBox): Part[] {
  const { width: w, depth: d, height: h } = box;
  const size = Math.min(w, d);
  const rose = clamp(h * 0.03, 10, 30);
  const shadeH = clamp(h * 0.35, 60, Math.max(60, h - rose - 20));
  return [
    discPart(0, 0, size * 0.3, h - rose, h, { slot: 'accent', role: 'hanging' }),
    legPart(0, 0, clamp(size * 0.02, 4, 10), shadeH, h - rose, 1, { role: 'hanging' }),
    legPart(0, 0, size / 1.6, 0, shadeH, 1.6, { slot: 'main', role: 'hanging' }),
  ];
}

/** A frame of four bars round a w × h face standing at the back of the box, `t` deep. */
function frame(w: number, h: number, y0: number, y1: number, bar: number): Part[] {
  return [
    boxPart(-w / 2, w / 2, y0, y1, 0, bar, { slot: 'accent' }),
    boxPart(-w / 2, w / 2, y0, y1, h - bar, h, { slot: 'accent' }),
    boxPart(-w / 2, -w / 2 + bar, y0, y1, bar, h - bar, { slot: 'accent' }),
    boxPart(w / 2 - bar, w / 2, y0, y1, bar, h - bar, { slot: 'accent' }),
  ];
}

/** A mirror: pale glass in a slim frame, standing at the back of the box. */
export function mirrorForm(box: FormBox): Part[] {
  const { width: w, depth: d, height: h } = box;
  const bar = clamp(Math.min(w, h) * 0.05, 10, 60);
  return [
    ...frame(w, h, -d / 2, d / 2, bar),
    panelPart(-w / 2 + bar, w / 2 - bar, -d / 2 + d * 0.3, d / 2 - d * 0.1, bar, h - bar, { colour: GLASS, role: 'front' }),
  ];
}

/** A picture: a frame, a pale mount and the picture itself in the main finish. */
export function pictureForm(box: FormBox): Part[] {
  const { width: w, depth: d, height: h } = box;
  const bar = clamp(Math.min(w, h) * 0.04, 8, 50);
  const mount = clamp(Math.min(w, h) * 0.1, 10, 120);
  return [
    ...frame(w, h, -d / 2, d / 2, bar),
    panelPart(-w / 2 + bar, w / 2 - bar, -d / 2, d / 2 - d * 0.5, bar, h - bar, { colour: MOUNT }),
    panelPart(-w / 2 + bar + mount, w / 2 - bar - mount, d / 2 - d * 0.5, d / 2 - d * 0.2, bar + mount, h - bar - mount, {
      role: 'front',
    }),
  ];
}

/** A plant in a pot: a tapered pot, a short trunk and three tiers of foliage narrowing upwards. */
export function plantForm(box: FormBox): Part[] {
  const { width: w, depth: d, height: h } = box;
  const size = Math.min(w, d);
  const potH = clamp(h * 0.3, 40, 500);
  const trunkH = (h - potH) * 0.2;
  const parts: Part[] = [
    legPart(0, 0, size * 0.6, 0, potH, 0.75, { slot: 'main', role: 'body' }),
    legPart(0, 0, clamp(size * 0.06, 8, 40), potH, potH + trunkH, 1, { colour: TRUNK }),
  ];
  const tiers = [1, 0.78, 0.5];
  let z = potH + trunkH;
  const tierH = (h - z) / tiers.length;
  tiers.forEach((share, i) => {
    parts.push(discPart(0, 0, size * share, z, z + tierH, { colour: LEAVES[i], role: 'top' }));
    z += tierH;
  });
  return parts;
}

/** A radiator: upright columns side by side between a top and a bottom header, hung at its elevation. */
export function radiatorForm(box: FormBox): Part[] {
  const { width: w, depth: d, height: h } = box;
  const header = clamp(h * 0.06, 15, 50);
  const columns = clamp(Math.floor(w / 55), 2, 40);
  const step = w / columns;
  const parts: Part[] = [
    boxPart(-w / 2, w / 2, -d / 2 + d * 0.25, d / 2 - d * 0.25, 0, header),
    boxPart(-w / 2, w / 2, -d / 2 + d * 0.25, d / 2 - d * 0.25, h - header, h),
  ];
  for (let i = 0; i < columns; i++) {
    const x0 = -w / 2 + i * step + step * 0.12;
    parts.push(panelPart(x0, x0 + step * 0.76, -d / 2, d / 2, header, h - header, { role: 'front' }));
  }
  return parts;
}

/** The plain block: the box itself. */
export function plainBlockForm(box: FormBox): Part[] {
  const { width: w, depth: d, height: h } = box;
  return [boxPart(-w / 2, w / 2, -d / 2, d / 2, 0, h)];
}
