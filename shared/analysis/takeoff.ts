// A room's quantities from its shell alone: inside-face areas, lengths, volume, and paint and
// flooring at the take-off settings. Pure: plan mm in, m², m, m³ and litres out, rounded for
// reporting. The analysis command prints these under its own documented names (analysis-output.ts).
import { type RoomShell } from '../schemas/room';
import { areaMm2, perimeterMm } from '../geometry/polygon';
import { skirtingLengthMm, skirtingRuns } from '../geometry/skirting';
import { distance } from '../geometry/vec';
import { takeoffSettingsSchema, type TakeoffSettingsInput } from './takeoff-settings';

/** Decimal places kept in reported quantities: 3 places of m² is 10 cm², well under what can be measured. */
export const REPORT_DECIMALS = 3;

export interface WallTakeoff {
  index: number;
  lengthM: number;
  grossAreaM2: number;
  openingsAreaM2: number;
  netAreaM2: number;
}

/** A room's quantities: areas m², lengths m, volume m³, paint litres. */
export interface Takeoff {
  floorAreaM2: number;
  perimeterM: number;
  ceilingAreaM2: number;
  volumeM3: number;
  walls: WallTakeoff[];
  netWallAreaM2: number;
  paint: { coats: number; coverageM2PerL: number; litres: number };
  flooring: { wastePercent: number; orderAreaM2: number };
  skirtingM: number;
}

/** A quantity rounded to REPORT_DECIMALS places. */
export function roundQuantity(value: number): number {
  const factor = 10 ** REPORT_DECIMALS;
  // The small nudge keeps values like 1.6725 (really 1.67249999…) rounding the way a person would.
  return Math.round(value * factor + Math.sign(value) * 1e-7) / factor;
}

const MM2_PER_M2 = 1_000_000;
const MM_PER_M = 1000;

/**
 * Quantities for a validated room shell (plan mm): inside-face areas (m²), lengths (m), paint
 * (litres) at the settings' coats and coverage, flooring with its waste. Sums use unrounded
 * values; only the reported numbers are rounded.
 */
export function computeTakeoff(
  shell: RoomShell,
  options: Pick<TakeoffSettingsInput, 'coats' | 'coverageM2PerL' | 'wastePercent'> = {},
): Takeoff {
  const settings = takeoffSettingsSchema.parse(options);
  const n = shell.outline.length;
  const floorMm2 = areaMm2(shell.outline);
  const perimeterLengthMm = perimeterMm(shell.outline);
  const heightMm = shell.wallHeight;

  const openingsMm2 = new Array<number>(n).fill(0);
  for (const opening of shell.openings) {
    if (opening.wall >= n) continue;
    openingsMm2[opening.wall]! += opening.width * opening.height;
  }

  let netWallMm2 = 0;
  const walls: WallTakeoff[] = shell.outline.map((corner, index) => {
    const lengthMm = distance(corner, shell.outline[(index + 1) % n]!);
    const grossMm2 = lengthMm * heightMm;
    const netMm2 = grossMm2 - openingsMm2[index]!;
    netWallMm2 += netMm2;
    return {
      index,
      lengthM: roundQuantity(lengthMm / MM_PER_M),
      grossAreaM2: roundQuantity(grossMm2 / MM2_PER_M2),
      openingsAreaM2: roundQuantity(openingsMm2[index]! / MM2_PER_M2),
      netAreaM2: roundQuantity(netMm2 / MM2_PER_M2),
    };
  });

  const floorM2 = floorMm2 / MM2_PER_M2;
  const netWallM2 = netWallMm2 / MM2_PER_M2;
  return {
    floorAreaM2: roundQuantity(floorM2),
    perimeterM: roundQuantity(perimeterLengthMm / MM_PER_M),
    ceilingAreaM2: roundQuantity(floorM2),
    volumeM3: roundQuantity((floorMm2 * heightMm) / (MM2_PER_M2 * MM_PER_M)),
    walls,
    netWallAreaM2: roundQuantity(netWallM2),
    paint: {
      coats: settings.coats,
      coverageM2PerL: settings.coverageM2PerL,
      litres: roundQuantity((netWallM2 * settings.coats) / settings.coverageM2PerL),
    },
    flooring: {
      wastePercent: settings.wastePercent,
      orderAreaM2: roundQuantity(floorM2 * (1 + settings.wastePercent / 100)),
    },
    // The runs the 3D view draws: stopped at doors and passages, on under windows (geometry/skirting).
    skirtingM: roundQuantity(skirtingLengthMm(skirtingRuns(shell)) / MM_PER_M),
  };
}
