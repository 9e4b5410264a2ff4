// How the plan looks: every colour, line width, dash, text size, opacity and handle size it draws
// with, named by what it is for. Sizes are in screen pixels (or multiples of the plan's one-pixel
// line), so they stay the same on screen whatever the zoom; plan-view.tsx turns them into plan mm.

/** The app's theme colours the plan shares (the values of `@theme` in src/styles.css). */
export const themeColour = {
  paper: '#f7f3ec',
  sand: '#efe8dc',
  lineStrong: '#c9bca8',
  ink: '#2a2521',
  inkSoft: '#5c534a',
  inkFaint: '#786e63',
  pine: '#2f6b5c',
  pineDark: '#24564a',
  pineWash: '#e3eee9',
  clay: '#a4472f',
} as const;

const white = '#ffffff';
/** The room's floor, and an opening's gap in the wall. */
const floor = '#fbf8f3';
/** The walls' cut, and a door's leaf. */
const wallCut = '#3a332d';

/** Every colour the plan draws with. */
export const planColour = {
  gridMinor: '#e9e2d6',
  gridMajor: '#dcd2c2',
  holdingFill: themeColour.sand,
  holdingStroke: themeColour.lineStrong,
  holdingText: themeColour.inkSoft,
  floor,
  wallFill: wallCut,
  openingFill: floor,
  openingSelectedFill: themeColour.pineWash,
  windowGlass: '#5b8fa8',
  doorLeaf: wallCut,
  doorSwing: themeColour.inkFaint,
  dimensionLine: '#a39889',
  dimensionLabelBack: themeColour.paper,
  dimensionText: themeColour.ink,
  dimensionTextSelected: themeColour.pineDark,
  /** What is selected: a wall, an opening's edge, a piece's outline, the handles. */
  selectedStroke: themeColour.pine,
  /** A piece a finding names, and a finding's narrow gap. */
  flaggedStroke: themeColour.clay,
  pieceStroke: themeColour.inkSoft,
  pieceFront: themeColour.inkFaint,
  /** A walked-over piece (a rug) reads as floor. */
  rugFill: '#f1e7d6',
  existingPieceFill: '#ece4d6',
  newPieceFill: white,
  /** A kind's accent parts (legs, frame) in a drawing without a finish. */
  accentPartFill: '#b8ab9b',
  /** The parts of a piece's top view: a little softer than the box outline. */
  partLine: '#8a7f73',
  labelDark: themeColour.ink,
  labelLight: '#fbf9f5',
  handleFill: white,
  draftStroke: themeColour.pine,
  draftText: themeColour.pineDark,
} as const;

/** Text on screen, px: the plan's text size and its weights. */
export const planText = {
  sizePx: 12,
  weight: 600,
  gapWeight: 700,
  /** A wall length's size, a share of the plan's text size. */
  dimensionScale: 0.95,
  /** The holding area's label sits this many text sizes above it. */
  holdingLabelRise: 0.7,
  /** A wall length's backing label, centred on the line: sizes and corner radius in text sizes. */
  dimensionBack: { halfWidth: 2.6, halfHeight: 0.75, width: 5.2, height: 1.5, radius: 0.3 },
} as const;

/** Line widths in multiples of the plan's one-pixel line (px on screen). */
export const planStroke = {
  basePx: 1,
  gridMinor: 0.6,
  gridMajor: 1,
  holding: 1,
  /** A wall can be picked this many px wide even when it is thinner on screen. */
  wallPickMin: 6,
  openingSelected: 1.5,
  windowGlass: 1,
  doorLeaf: 1.2,
  doorSwing: 0.8,
  dimension: 0.7,
  piece: 1.1,
  pieceSelected: 2.4,
  pieceFront: 2.4,
  partLine: 0.7,
  turnArm: 1,
  handle: 1.5,
  corner: 1.6,
  gap: 2,
  /** The floor a blocked door or drawer opens into. */
  zone: 1,
  draft: 2,
  draftCorner: 1,
  preview: 2,
} as const;

/** Dash patterns: dash and gap in multiples of the plan's one-pixel line. */
export const planDash = {
  holding: [4, 3],
  doorSwing: [3, 2.5],
  /** A piece raised off the floor (not a rug). */
  raisedPiece: [4, 2],
  walkPreview: [6, 4],
  /** The floor a blocked door or drawer opens into: drawn like a door's swing. */
  zone: [3, 2.5],
} as const satisfies Record<string, readonly [number, number]>;

/** An SVG dash array for a pattern at the plan's one-pixel line (plan mm). */
export function dashArray(pattern: readonly [number, number], stroke: number): string {
  return `${stroke * pattern[0]} ${stroke * pattern[1]}`;
}

/** Opacities. */
export const planOpacity = {
  /** A piece walked under (hung above head height) is drawn faded. */
  walkedUnder: 0.75,
  pieceFill: 0.95,
  rugFill: 0.8,
  /** The wash over the floor a blocked door or drawer opens into. */
  zoneFill: 0.08,
} as const;

/** Handles and marks: radii in multiples of the plan's one-pixel line, lengths in plan mm. */
export const planHandle = {
  cornerRadius: 6,
  turnRadius: 7,
  draftCornerRadius: 4,
  /** How far in front of a piece its turning handle sits (plan mm). */
  turnArmMm: 280,
  /** Half the length of a wall length's end ticks (plan mm). */
  dimensionTickMm: 80,
  /** The holding area's corner radius (plan mm). */
  holdingRadiusMm: 120,
  /** A drawn outline closes on a click this many px from its first corner (or CLOSE_SNAP_MM). */
  closeSnapPx: 14,
} as const;

/** Where a window's two glass lines sit across the wall, as shares from inside to outside. */
export const WINDOW_GLASS_AT = [0.35, 0.65] as const;

/** The background grid's squares (plan mm): a fine one, and a bolder one every metre. */
export const planGrid = { minorMm: 100, majorMm: 1000 } as const;
