// Tests for the `narrow-walkway` and `unreachable` findings: gaps on the way to each piece's front,
// shut-in pieces, routes over rugs and under high shelves, and rooms with no way in.
import { describe, expect, it } from 'vitest';
import { HEAD_CLEARANCE_MM } from '../../geometry/piece';
import { placedBoxes } from './boxes';
import { checkFit } from './index';
import { cleanLayout, gapLayout, pieceInput, plan, walledInLayout } from './test-plans';
import { findWalkwayProblems, WALKWAY_CELL_MM } from './walkway';
import type { PieceInput } from '../../schemas/option';
import type { RoomShellInput } from '../../schemas/room';

function walkway(layout: { room: RoomShellInput; pieces: PieceInput[] }, walkwayMm = 900) {
  const { room, option } = plan(layout.room, layout.pieces);
  return findWalkwayProblems(room, placedBoxes(option.pieces), walkwayMm);
}

describe('narrow-walkway', () => {
  it('finds the 620 mm gap between the bed and the chest on the way to the chest’s front', () => {
    const findings = walkway(gapLayout());
    expect(findings).toHaveLength(1);
    const [gap] = findings;
    expect(gap.kind).toBe('narrow-walkway');
    expect(gap.pieces).toEqual(['chest', 'bed']);
    expect(gap.openings).toEqual(['d1']);
    expect(Math.abs((gap.measuredMm ?? 0) - 620)).toBeLessThanOrEqual(WALKWAY_CELL_MM);
    expect(gap.requiredMm).toBe(900);
    expect(gap.message).toBe('Only 62 cm to pass between the bed and the chest');
    // The narrow spot is in the gap (x 2000–2620, y 1750–2250) and is drawn across it.
    const [x, y] = gap.at ?? [NaN, NaN];
    expect(x).toBeGreaterThan(2000);
    expect(x).toBeLessThan(2620);
    expect(y).toBeGreaterThanOrEqual(1750 - WALKWAY_CELL_MM);
    expect(y).toBeLessThanOrEqual(2250 + WALKWAY_CELL_MM);
    const [from, to] = gap.between ?? [
      [0, 0],
      [0, 0],
    ];
    expect(Math.hypot(from[0] - to[0], from[1] - to[1])).toBeCloseTo(620, 0);
    expect([from[0], to[0]].sort((a, b) => a - b)).toEqual([2000, 2620]);
  });

  it('tracks the gap as it changes, within one cell', () => {
    for (const gapMm of [480, 555, 700, 830]) {
      const [gap] = walkway(gapLayout(gapMm));
      expect(Math.abs((gap.measuredMm ?? 0) - gapMm)).toBeLessThanOrEqual(WALKWAY_CELL_MM);
    }
  });

  it('says nothing once the gap reaches the walkway width, or when a narrower walkway is asked for', () => {
    expect(walkway(gapLayout(900))).toEqual([]);
    expect(walkway(gapLayout(950))).toEqual([]);
    expect(walkway(gapLayout(620), 600)).toEqual([]);
    expect(walkway(gapLayout(620), 650)).toHaveLength(1);
  });

  it('reports a piece facing a wall 100 mm away', () => {
    // A bookcase turned 180° so its front faces the top wall, 100 mm off it (y 100–400).
    const findings = walkway({
      room: gapLayout().room,
      pieces: [
        pieceInput({ id: 'bookcase', name: 'Bookcase', x: 1500, y: 250, width: 1000, depth: 300, height: 1800, rotation: 180 }),
      ],
    });
    expect(findings).toHaveLength(1);
    expect(findings[0].kind).toBe('narrow-walkway');
    expect(findings[0].message).toBe('Only 10 cm to pass between the bookcase and the wall');
    expect(Math.abs((findings[0].measuredMm ?? 0) - 100)).toBeLessThanOrEqual(WALKWAY_CELL_MM);
  });

  it('names the piece to reach when the gap is between two others', () => {
    // A desk in the bottom half of the gap plan, facing down: its route also squeezes through the gap.
    const layout = gapLayout();
    layout.pieces.push(
      pieceInput({ id: 'desk', name: 'Desk', x: 3000, y: 3700, width: 1200, depth: 600, height: 750, rotation: 180 }),
    );
    const desk = walkway(layout).find((f) => f.pieces[0] === 'desk');
    expect(desk?.message).toBe('Only 62 cm to pass between the bed and the chest to reach the desk');
    expect(desk?.pieces).toEqual(['desk', 'bed', 'chest']);
  });
});

describe('unreachable', () => {
  it('reports a cabinet shut in by a bookcase and a wardrobe, and nothing else', () => {
    const findings = walkway(walledInLayout());
    expect(findings).toEqual([
      {
        kind: 'unreachable',
        pieces: ['cabinet'],
        openings: ['d1'],
        message: 'The front of the cabinet cannot be reached from any door',
      },
    ]);
  });

  it('reports a piece whose front is flush against a wall', () => {
    const findings = walkway({
      room: gapLayout().room,
      pieces: [
        pieceInput({ id: 'bookcase', name: 'Bookcase', x: 1500, y: 150, width: 1000, depth: 300, height: 1800, rotation: 180 }),
      ],
    });
    expect(findings.map((f) => f.kind)).toEqual(['unreachable']);
  });

  it('reports every piece when a wardrobe shuts the only door', () => {
    // The door is x 2800–3620 on the top wall; the wardrobe covers x 2700–3700, y 0–600.
    const layout = gapLayout(1000);
    layout.pieces.push(pieceInput({ id: 'wardrobe', name: 'Wardrobe', x: 3200, y: 300, width: 1000, depth: 600, height: 2000 }));
    expect(walkway(layout).map((f) => [f.kind, f.pieces[0]])).toEqual([
      ['unreachable', 'bed'],
      ['unreachable', 'chest'],
      ['unreachable', 'wardrobe'],
    ]);
  });
});

describe('walkway rules', () => {
  it('says nothing about a clean layout: a bookcase facing the room, a cabinet over a sideboard, a rug', () => {
    expect(walkway(cleanLayout())).toEqual([]);
  });

  it('says nothing in a room with no door or passage: there is no way in to judge from', () => {
    const layout = walledInLayout();
    layout.room.openings = [];
    expect(walkway(layout)).toEqual([]);
  });

  it('lets a route pass over a rug and under a shelf above head height, not under a cabinet at 1400 mm', () => {
    const layout = gapLayout();
    // Filling the gap with a rug or a shelf hung at the head clearance leaves the route as it was.
    layout.pieces.push(pieceInput({ id: 'rug', name: 'Rug', x: 2310, y: 2000, width: 620, depth: 500, height: 15 }));
    layout.pieces.push(
      pieceInput({
        id: 'shelf',
        name: 'Shelf',
        x: 2310,
        y: 2000,
        width: 620,
        depth: 500,
        height: 300,
        elevation: HEAD_CLEARANCE_MM,
      }),
    );
    expect(walkway(layout).map((f) => f.pieces[0])).toEqual(['chest']);
    // A cabinet hung at 1400 mm is at head and shoulder height: the gap is shut as by a stool.
    const hung = gapLayout();
    hung.pieces.push(
      pieceInput({ id: 'cabinet', name: 'Cabinet', x: 2310, y: 2000, width: 620, depth: 500, height: 600, elevation: 1400 }),
    );
    expect(
      walkway(hung)
        .filter((f) => f.kind === 'unreachable')
        .map((f) => f.pieces[0])
        .sort(),
    ).toEqual(['cabinet', 'chest']);
    // A floor-standing stool in the gap shuts it: the chest's front and the stool's own (facing the
    // bottom half) are cut off.
    layout.pieces.push(pieceInput({ id: 'stool', name: 'Stool', x: 2310, y: 2000, width: 620, depth: 500, height: 450 }));
    expect(
      walkway(layout)
        .filter((f) => f.kind === 'unreachable')
        .map((f) => f.pieces[0])
        .sort(),
    ).toEqual(['chest', 'stool']);
  });

  it('starts from passages as well as doors', () => {
    const layout = walledInLayout();
    // A passage in the pocket's own right wall (x 4000, y 600–900) reaches the cabinet's front.
    layout.room.openings = [
      ...(layout.room.openings ?? []),
      { id: 'p1', type: 'passage', wall: 1, offset: 600, width: 300, height: 2100 },
    ];
    const cabinet = walkway(layout).find((f) => f.pieces[0] === 'cabinet');
    expect(cabinet?.kind).toBe('narrow-walkway');
    expect(cabinet?.openings).toEqual(['p1']);
  });

  it('ignores pieces in the holding area', () => {
    const layout = walledInLayout();
    layout.pieces[1] = { ...layout.pieces[1], placed: false };
    expect(walkway(layout)).toEqual([]);
  });

  it('checks a room drawn the other way round the same', () => {
    const layout = gapLayout();
    const reversed = {
      ...layout.room,
      outline: [
        [0, 0],
        [0, 4000],
        [4000, 4000],
        [4000, 0],
      ] as [number, number][],
    };
    // The top wall is now wall 3, from (4000, 0) to (0, 0): the door's near edge is 4000 − 3620 = 380 from its start.
    reversed.openings = [{ id: 'd1', type: 'door', wall: 3, offset: 380, width: 820, height: 2040, hinge: 'end', swing: 'out' }];
    const [gap] = checkFit(plan(reversed, layout.pieces).room, plan(reversed, layout.pieces).option.pieces);
    expect(gap.kind).toBe('narrow-walkway');
    expect(gap.message).toBe('Only 62 cm to pass between the bed and the chest');
  });
});
