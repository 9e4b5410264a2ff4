// Tests for walking through a room in the 3D view: a body stopped by walls, windows, open door
// leaves and pieces, let through doors and passages and over rugs, and where a walk starts.
import { describe, expect, it } from 'vitest';
import { pieceFromCatalogue } from '../catalogue/catalogue';
import type { Piece } from '../schemas/option';
import { roomShellSchema, type RoomShell } from '../schemas/room';
import { HEAD_CLEARANCE_MM } from './piece';
import { pointInPolygon } from './polygon';
import { DOOR_LEAF_THICKNESS_MM } from './scene';
import {
  BODY_RADIUS_MM,
  THRESHOLD_DEPTH_MM,
  clearanceMm,
  floorCentreMm,
  moveBody,
  walkLine,
  walkObstacles,
  walkStart,
} from './walk';

const R = BODY_RADIUS_MM;
const WALL_MM = 100;

// 4 m × 3 m; a door on the top wall (wall 0) from x 400 to 1220, hinged at its start, opening in;
// a window on the right wall, a passage on the bottom wall from x 2600 to 3500.
const shell: RoomShell = roomShellSchema.parse({
  outline: [
    [0, 0],
    [4000, 0],
    [4000, 3000],
    [0, 3000],
  ],
  wallThickness: WALL_MM,
  openings: [
    { id: 'door', type: 'door', wall: 0, offset: 400, width: 820, height: 2040, hinge: 'start', swing: 'in' },
    { id: 'window', type: 'window', wall: 1, offset: 800, width: 1200, height: 1200, sill: 900 },
    // Wall 2 runs from (4000, 3000) to (0, 3000): 500 along it is x 3500.
    { id: 'passage', type: 'passage', wall: 2, offset: 500, width: 900, height: 2100 },
  ],
});

const piece = (id: string, x: number, y: number, width: number, depth: number, extra: Partial<Piece> = {}): Piece => ({
  id,
  name: id,
  x,
  y,
  width,
  depth,
  height: 800,
  rotation: 0,
  elevation: 0,
  status: 'new',
  placed: true,
  ...extra,
});

const empty = walkObstacles(shell, []);

describe('walking into walls', () => {
  it('stops a body one radius from a wall it walks straight at, however far it tries to go', () => {
    expect(moveBody(empty, [2000, 1500], [0, -3000])).toEqual([2000, R]);
    // A single huge step must not pass through either.
    const far = moveBody(empty, [2000, 1500], [-100_000, 0]);
    expect(far[0]).toBeCloseTo(R, 6);
    expect(far[1]).toBeCloseTo(1500, 6);
  });

  it('slides along a wall it meets at an angle, as a person does', () => {
    const [x, y] = moveBody(empty, [2000, 1500], [1000, -2000]);
    expect(y).toBeCloseTo(R, 6);
    expect(x).toBeCloseTo(3000, 6);
  });

  it('stops at a window: it is in the wall, not a way through', () => {
    const [x] = moveBody(empty, [3000, 1400], [3000, 0]);
    expect(x).toBeCloseTo(4000 - R, 6);
  });
});

describe('doors and passages', () => {
  it('lets a body through a door into the threshold, and stops it there at the far side', () => {
    const [x, y] = moveBody(empty, [810, 1500], [0, -5000]);
    expect(x).toBeCloseTo(810, 6);
    // Past the inside face (y 0) and the outer face (y −100), to the end of the threshold.
    expect(y).toBeCloseTo(-(WALL_MM + THRESHOLD_DEPTH_MM) + R, 6);
  });

  it('lets a body through a passage too, but not through the wall beside it', () => {
    expect(moveBody(empty, [3050, 1500], [0, 5000])[1]).toBeCloseTo(3000 + WALL_MM + THRESHOLD_DEPTH_MM - R, 6);
    expect(moveBody(empty, [1800, 1500], [0, 5000])[1]).toBeCloseTo(3000 - R, 6);
  });

  it('is stopped by the door’s open leaf, standing into the room at its hinge', () => {
    // The leaf runs from the hinge (400, 0) into the room, 40 mm thick towards the opening.
    const [x, y] = moveBody(empty, [1000, 500], [-2000, 0]);
    expect(x).toBeCloseTo(400 + DOOR_LEAF_THICKNESS_MM + R, 6);
    expect(y).toBeCloseTo(500, 6);
  });
});

describe('pieces', () => {
  it('stops a body at a piece’s side, turned as the piece is turned', () => {
    const square = walkObstacles(shell, [piece('table', 2000, 1500, 1000, 600)]);
    expect(moveBody(square, [2000, 2700], [0, -2000])[1]).toBeCloseTo(1500 + 300 + R, 6);
    const turned = walkObstacles(shell, [piece('table', 2000, 1500, 1000, 600, { rotation: 90 })]);
    expect(moveBody(turned, [2000, 2700], [0, -2000])[1]).toBeCloseTo(1500 + 500 + R, 6);
  });

  it('walks under a piece hung above head height, and ignores pieces in the holding area', () => {
    const obstacles = walkObstacles(shell, [
      piece('high-shelf', 2000, 1500, 1000, 600, { elevation: HEAD_CLEARANCE_MM }),
      piece('waiting', 2000, 1500, 1000, 600, { placed: false }),
    ]);
    expect(obstacles.boxes.map((b) => b.id)).toEqual(['door:door']);
    expect(moveBody(obstacles, [2000, 2700], [0, -2000])[1]).toBeCloseTo(700, 6);
  });

  it('walks across a 2 × 1.4 m rug and under a wall shelf hung above head height', () => {
    const rug = pieceFromCatalogue('rug', 'rug', [2000, 1500]);
    const shelf = { ...pieceFromCatalogue('wall-shelf', 'shelf', [2000, 1000]), elevation: HEAD_CLEARANCE_MM + 100 };
    expect([rug.width, rug.depth]).toEqual([2000, 1400]);
    const obstacles = walkObstacles(shell, [rug, shelf]);
    expect(obstacles.boxes.map((b) => b.id)).toEqual(['door:door']);
    // From below the rug, straight up across it and under the shelf to a step from the top wall.
    const end = moveBody(obstacles, [2000, 2700], [0, -2400]);
    expect(end[0]).toBeCloseTo(2000, 6);
    expect(end[1]).toBeCloseTo(300, 6);
    expect(walkLine(obstacles, [2000, 2700], [2000, 300])).toEqual([2000, 300]);
  });

  it('is stopped by a sofa and by a wall cabinet hung below head height', () => {
    const sofa = pieceFromCatalogue('sofa-3-seat', 'sofa', [2000, 1500]);
    const stopsAtSofa = moveBody(walkObstacles(shell, [sofa]), [2000, 2700], [0, -2400]);
    expect(stopsAtSofa[1]).toBeCloseTo(1500 + sofa.depth / 2 + R, 6);
    // The catalogue's wall cabinet hangs at 1400 mm: at head and shoulder height, so walked round.
    const cabinet = pieceFromCatalogue('wall-cabinet', 'cabinet', [2000, 1500]);
    expect(cabinet.elevation).toBeLessThan(HEAD_CLEARANCE_MM);
    const obstacles = walkObstacles(shell, [cabinet]);
    expect(moveBody(obstacles, [2000, 2700], [0, -2400])[1]).toBeCloseTo(1500 + cabinet.depth / 2 + R, 6);
    expect(walkLine(obstacles, [2000, 2700], [2000, 300])[1]).toBeGreaterThanOrEqual(1500 + cabinet.depth / 2 + R - 1);
  });

  it('pushes a body that finds itself inside a piece out through the nearest side', () => {
    const obstacles = walkObstacles(shell, [piece('bed', 2000, 1500, 1400, 2000)]);
    const [x, y] = moveBody(obstacles, [2600, 1400], [0, 0]);
    expect(x).toBeCloseTo(2000 + 700 + R, 6);
    expect(y).toBeCloseTo(1400, 6);
  });

  it('measures clearance to the nearest wall or piece', () => {
    const obstacles = walkObstacles(shell, [piece('chest', 3000, 1500, 800, 400)]);
    expect(clearanceMm(obstacles, [3000, 2000])).toBeCloseTo(300, 6);
    expect(clearanceMm(obstacles, [3000, 1500])).toBeLessThan(0);
    expect(clearanceMm(obstacles, [1500, 200])).toBeCloseTo(200, 6);
  });
});

describe('walking to a point', () => {
  it('goes straight to a free point and stops short of the first thing in the way, without sliding', () => {
    const obstacles = walkObstacles(shell, [piece('table', 2000, 1500, 1000, 600)]);
    expect(walkLine(obstacles, [1000, 2500], [3000, 2500])).toEqual([3000, 2500]);
    const [x, y] = walkLine(obstacles, [2000, 2700], [2000, 200]);
    expect(x).toBe(2000);
    expect(y).toBeGreaterThanOrEqual(1500 + 300 + R);
    expect(y).toBeLessThan(1500 + 300 + R + R * 0.25 + 1e-6);
  });

  it('walks away from a wall it rests against', () => {
    const resting = moveBody(empty, [2000, 1500], [0, -3000]);
    const [, y] = walkLine(empty, resting, [2000, 2000]);
    expect(y).toBe(2000);
  });
});

describe('where a walk starts', () => {
  it('stands a step inside the first door, facing the middle of the floor', () => {
    const start = walkStart(shell, empty);
    expect(start.position[0]).toBeCloseTo(810, 6);
    expect(start.position[1]).toBeGreaterThan(R);
    expect(pointInPolygon(start.position, shell.outline)).toBe(true);
    expect(clearanceMm(empty, start.position)).toBeGreaterThanOrEqual(R);
    const [x, y] = start.position;
    expect(start.headingDeg).toBeCloseTo((Math.atan2(1500 - y, 2000 - x) * 180) / Math.PI, 6);
  });

  it('stands clear of the open door leaf, past its tip, so the leaf is beside or behind', () => {
    // The leaf stands from the hinge (400, 0) 820 mm into the room; the start is a step beyond that.
    const start = walkStart(shell, empty);
    const leaf = walkObstacles(shell, []).boxes.find((b) => b.id === 'door:door')!;
    const toLeaf = clearanceMm({ segments: [], boxes: [leaf], outline: shell.outline }, start.position);
    expect(toLeaf).toBeGreaterThanOrEqual(R + 300);
    expect(start.position[1]).toBeGreaterThan(820);
    // Facing the middle of the floor (2000, 1500) from there looks away from the leaf, not at it.
    const heading = (start.headingDeg * Math.PI) / 180;
    const towardsLeaf = [400 - start.position[0], 410 - start.position[1]];
    expect(Math.cos(heading) * towardsLeaf[0] + Math.sin(heading) * towardsLeaf[1]).toBeLessThan(0);
  });

  it('in a room too shallow to pass the leaf, still stands a free step inside the door', () => {
    const shallow = roomShellSchema.parse({
      outline: [
        [0, 0],
        [4000, 0],
        [4000, 1200],
        [0, 1200],
      ],
      openings: [{ id: 'door', type: 'door', wall: 0, offset: 400, width: 820, height: 2040, hinge: 'start', swing: 'in' }],
    });
    const obstacles = walkObstacles(shallow, []);
    const start = walkStart(shallow, obstacles);
    expect(start.position[0]).toBeCloseTo(810, 6);
    expect(pointInPolygon(start.position, shallow.outline)).toBe(true);
    expect(clearanceMm(obstacles, start.position)).toBeGreaterThanOrEqual(R);
  });

  it('faces straight in where the middle of the floor is not in the room', () => {
    // A U: its middle falls in the notch between the arms. The door is at the bottom of the left arm.
    const u = roomShellSchema.parse({
      outline: [
        [0, 0],
        [1500, 0],
        [1500, 3000],
        [3000, 3000],
        [3000, 0],
        [4500, 0],
        [4500, 4500],
        [0, 4500],
      ],
      openings: [{ id: 'door', type: 'door', wall: 7, offset: 1500, width: 820, height: 2040, hinge: 'start', swing: 'in' }],
    });
    expect(pointInPolygon(floorCentreMm(u.outline), u.outline)).toBe(false);
    const start = walkStart(u, walkObstacles(u, []));
    expect(start.headingDeg).toBeCloseTo(0, 6);
  });

  it('finds the middle of a floor by area', () => {
    expect(
      floorCentreMm([
        [0, 0],
        [4000, 0],
        [4000, 3000],
        [0, 3000],
      ]),
    ).toEqual([2000, 1500]);
    expect(
      floorCentreMm([
        [0, 0],
        [0, 3000],
        [4000, 3000],
        [4000, 0],
      ]),
    ).toEqual([2000, 1500]);
  });

  it('without a door or passage, stands in the freest place, inside the room', () => {
    const closed = roomShellSchema.parse({
      outline: [
        [0, 0],
        [3000, 0],
        [3000, 3000],
        [0, 3000],
      ],
    });
    const obstacles = walkObstacles(closed, [piece('rug-table', 1500, 1500, 800, 800)]);
    const start = walkStart(closed, obstacles);
    expect(pointInPolygon(start.position, closed.outline)).toBe(true);
    expect(clearanceMm(obstacles, start.position)).toBeGreaterThanOrEqual(R);
  });
});
