// Common sizes offered when adding an opening (plan mm). The opening is as wide as the door leaf.
import { MM_PER_INCH } from '../units/length';

export interface OpeningPreset {
  label: string;
  width: number;
  height: number;
  source: string;
}

const METRIC_LEAVES = 'UK/EU metric door leaves, 2040 mm high (trade convention; summary)';
const US_LEAVES = 'US interior door leaves, 80 in (6 ft 8 in) high (trade convention; summary)';

/** Door widths by leaf size: metric 626/726/826/926 × 2040 mm, US 24–36 in × 80 in (1 in = 25.4 mm, NIST SP 811). */
export const DOOR_PRESETS: OpeningPreset[] = [
  ...[626, 726, 826, 926].map((width) => ({ label: `${width / 10} cm`, width, height: 2040, source: METRIC_LEAVES })),
  ...[24, 28, 30, 32, 36].map((inches) => ({
    label: `${inches} in`,
    width: inches * MM_PER_INCH,
    height: 80 * MM_PER_INCH,
    source: US_LEAVES,
  })),
];

/** A door leaf needs 34 in for a nominal 32 in (812.8 mm) clear opening (HUD Fair Housing Accessibility Guidelines). */
export const ACCESSIBLE_CLEAR_WIDTH_MM = 32 * MM_PER_INCH;

/** Window sizes to start from (common practice, no source): width × height above a sill. */
export const WINDOW_PRESETS: (OpeningPreset & { sill: number })[] = [
  { label: 'Small 60 × 90', width: 600, height: 900, sill: 1000, source: 'common practice' },
  { label: 'Medium 120 × 120', width: 1200, height: 1200, sill: 900, source: 'common practice' },
  { label: 'Wide 180 × 130', width: 1800, height: 1300, sill: 800, source: 'common practice' },
  { label: 'Full height 90 × 210', width: 900, height: 2100, sill: 0, source: 'common practice' },
];

/** Passage (an open gap, no door) widths to start from: common practice, no source. */
export const PASSAGE_PRESETS: OpeningPreset[] = [
  { label: '90 cm', width: 900, height: 2100, source: 'common practice' },
  { label: '120 cm', width: 1200, height: 2100, source: 'common practice' },
];
