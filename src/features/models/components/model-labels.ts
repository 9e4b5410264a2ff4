// Short formats for piece models: the measured size in the user's unit, storage in MB or GB, and the
// unit fix's words.
import type { ModelSize, PieceModel } from '../../../../shared/schemas/piece-model';
import { formatLength, type LengthUnit } from '../../../../shared/units/length';

const KB = 1024;
const MB = KB * 1024;
const GB = MB * 1024;

/** "45 × 50 × 90 cm": width × depth × height, the unit said once at the end, thousands grouped in `locale` ("2,100 × 900 × 850 mm"). */
export function formatModelSize(size: ModelSize, unit: LengthUnit, locale?: string): string {
  const parts = [size.widthMm, size.depthMm, size.heightMm].map((mm) => formatLength(mm, unit, { locale }));
  const suffix = / (mm|cm|m)$/.exec(parts[2])?.[0] ?? '';
  return suffix ? `${parts.map((p) => p.slice(0, p.length - suffix.length)).join(' × ')}${suffix}` : parts.join(' × ');
}

/** "312 MB", "1.4 GB", "18 KB". */
export function formatStorage(bytes: number): string {
  if (bytes >= GB) return `${Number((bytes / GB).toFixed(1))} GB`;
  if (bytes >= MB) return `${Math.round(bytes / MB)} MB`;
  return `${Math.max(bytes > 0 ? 1 : 0, Math.round(bytes / KB))} KB`;
}

export const UNIT_FIX: Record<'cm' | 'mm', { scale: 0.01 | 0.001; words: string }> = {
  cm: { scale: 0.01, words: 'centimetres' },
  mm: { scale: 0.001, words: 'millimetres' },
};

/** The size the model would have once read in its hinted unit, or null when no fix is offered. */
export function fixedSize(model: Pick<PieceModel, 'size' | 'unitHint'>): ModelSize | null {
  if (!model.size || !model.unitHint) return null;
  const f = UNIT_FIX[model.unitHint].scale;
  return { widthMm: model.size.widthMm * f, depthMm: model.size.depthMm * f, heightMm: model.size.heightMm * f };
}
