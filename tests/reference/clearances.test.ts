// Published clearances and what the fit check does with them (sources and status: docs/references.md).
import { describe, expect, it } from 'vitest';
import { checkFit } from '../../shared/analysis/fit/index';
import { clearPassMm, passesThrough } from '../../shared/analysis/fit/door-fit';
import { gapLayout, plan } from '../../shared/analysis/fit/test-plans';
import { DEFAULT_WALKWAY_MM } from '../../shared/analysis/fit/clearances';
import type { Opening } from '../../shared/schemas/room';
import { MM_PER_INCH } from '../../shared/units/length';

const IRC_HALLWAY_MM = 36 * MM_PER_INCH; // IRC 2012+ R311.6: hallway ≥ 36 in (914.4 mm, derived)
const ADA_ROUTE_MM = 36 * MM_PER_INCH; // 2010 ADA Standards §403.5.1: accessible route ≥ 36 in
const ADA_DOOR_CLEAR_MM = 32 * MM_PER_INCH; // 2010 ADA Standards §404.2.3: door clear width ≥ 32 in (812.8 mm)
const ADA_DOOR_CLEAR_PRINTED_MM = 815; // the same, as the 2010 ADA Standards print it in metric
const HUD_LEAF_MM = 34 * MM_PER_INCH; // HUD Fair Housing Accessibility Guidelines: a 34 in leaf gives …
const HUD_LEAF_CLEAR_MM = 32 * MM_PER_INCH; // … a nominal 32 in clear opening

/** The findings for the bed-and-chest plan with a gap of gapMm, at the given walkway width. */
function walkwayKinds(gapMm: number, walkwayMm?: number): string[] {
  const { room, option } = plan(gapLayout(gapMm).room, gapLayout(gapMm).pieces);
  return checkFit(room, option.pieces, walkwayMm === undefined ? {} : { walkwayMm }).map((f) => f.kind);
}

describe('walkway width', () => {
  it('defaults to 900 mm, the common-practice figure, 14.4 mm under the 36 in of IRC R311.6 and ADA §403.5.1', () => {
    expect(DEFAULT_WALKWAY_MM).toBe(900); // common practice; docs/references.md
    expect(IRC_HALLWAY_MM).toBeCloseTo(914.4, 9);
    expect(ADA_ROUTE_MM).toBeCloseTo(914.4, 9);
    expect(IRC_HALLWAY_MM - DEFAULT_WALKWAY_MM).toBeCloseTo(14.4, 9);
  });

  it('accepts a 36 in gap and a 900 mm one at the default, and reports 880 mm', () => {
    expect(walkwayKinds(IRC_HALLWAY_MM)).toEqual([]);
    expect(walkwayKinds(900)).toEqual([]);
    expect(walkwayKinds(880)).toEqual(['narrow-walkway']);
  });

  it('reports a 900 mm gap when the code’s 36 in is asked for, and passes a 36 in one', () => {
    expect(walkwayKinds(900, IRC_HALLWAY_MM)).toEqual(['narrow-walkway']);
    expect(walkwayKinds(920, IRC_HALLWAY_MM)).toEqual([]);
  });
});

describe('door clear width', () => {
  const leaf34: Opening = {
    id: 'd',
    type: 'door',
    wall: 0,
    offset: 0,
    width: HUD_LEAF_MM,
    height: 2032,
    hinge: 'start',
    swing: 'in',
  };

  it('takes a 34 in leaf to a 32 in clear opening, as HUD FHAG does', () => {
    expect(clearPassMm(leaf34).widthMm).toBeCloseTo(HUD_LEAF_CLEAR_MM, 9);
    expect(HUD_LEAF_CLEAR_MM).toBeCloseTo(ADA_DOOR_CLEAR_MM, 9);
  });

  it('passes an 800 mm piece through the 32 in clear of a 34 in leaf (800 + 10 ≤ 812.8), not an 805 mm one', () => {
    expect(passesThrough([800, 1900, 2000], clearPassMm(leaf34))).toBe(true);
    expect(passesThrough([805, 1900, 2000], clearPassMm(leaf34))).toBe(false);
  });

  it('passes an 800 mm piece through a passage of the printed 815 mm clear width', () => {
    const passage: Opening = { id: 'p', type: 'passage', wall: 0, offset: 0, width: ADA_DOOR_CLEAR_PRINTED_MM, height: 2100 };
    expect(passesThrough([800, 1900, 2000], clearPassMm(passage))).toBe(true);
    expect(passesThrough([806, 1900, 2000], clearPassMm(passage))).toBe(false);
  });
});
