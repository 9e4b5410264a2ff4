// How a piece model sits in its piece: turned by its quarter-turn correction, scaled uniformly to
// fit inside the piece's box (never stretched, never past what the checks measured), centred on the
// box across and deep, standing on the box's bottom (the piece's elevation). Pure: the scene applies
// the answer to the loaded model. glTF is in metres, Y up, front +Z; the piece's own +y front is the
// scene's +Z at rotation 0.

/** A model's bounds as loaded, in its own units (metres for glTF): lowest and highest corner [x, y, z]. */
export interface ModelBounds {
  min: readonly [number, number, number];
  max: readonly [number, number, number];
}

export interface ModelFit {
  /** Quarter-turn about Y (radians, right-handed, Y up) applied to the centred model. */
  turnRad: number;
  /** The uniform scale from model units to scene metres. */
  scale: number;
  /** Translation of the model before turning and scaling, so its footprint centre and bottom sit at the origin. */
  offset: [number, number, number];
  /** The fitted model's size in mm: across (piece x), deep (piece y), high. */
  fittedMm: { widthMm: number; depthMm: number; heightMm: number };
}

const MM_PER_M = 1000;

/**
 * The fit of a model with `bounds` and quarter turn `turnDeg` (0, 90, 180 or 270; 90 turns a model
 * facing −X to face +Z) into a box of width × depth × height mm.
 */
export function fitModelInBox(
  bounds: ModelBounds,
  turnDeg: number,
  box: { width: number; depth: number; height: number },
): ModelFit | null {
  const sizeX = bounds.max[0] - bounds.min[0];
  const height = bounds.max[1] - bounds.min[1];
  const sizeZ = bounds.max[2] - bounds.min[2];
  const size = [sizeX, height, sizeZ];
  if (size.some((v) => !Number.isFinite(v) || v < 0) || size.every((v) => v === 0)) return null;
  const across = turnDeg === 90 || turnDeg === 270;
  const turnedWidth = across ? sizeZ : sizeX;
  const turnedDepth = across ? sizeX : sizeZ;
  const limits: [number, number][] = [
    [turnedWidth, box.width / MM_PER_M],
    [turnedDepth, box.depth / MM_PER_M],
    [height, box.height / MM_PER_M],
  ];
  const scale = Math.min(...limits.filter(([has]) => has > 0).map(([has, room]) => room / has));
  return {
    turnRad: (turnDeg * Math.PI) / 180,
    scale,
    offset: [-(bounds.min[0] + bounds.max[0]) / 2, -bounds.min[1], -(bounds.min[2] + bounds.max[2]) / 2],
    fittedMm: {
      widthMm: turnedWidth * scale * MM_PER_M,
      depthMm: turnedDepth * scale * MM_PER_M,
      heightMm: height * scale * MM_PER_M,
    },
  };
}

/** The fraction by which a model's size differs from a box on its worst side (0.02 is 2 %). */
export function sizeDifference(
  model: { widthMm: number; depthMm: number; heightMm: number },
  box: { width: number; depth: number; height: number },
): number {
  const pairs: [number, number][] = [
    [model.widthMm, box.width],
    [model.depthMm, box.depth],
    [model.heightMm, box.height],
  ];
  return Math.max(...pairs.map(([m, b]) => (b > 0 ? Math.abs(m - b) / b : 0)));
}

/** Above this difference the designer is asked to use the model's size or fit it into the box (common practice). */
export const MODEL_SIZE_TOLERANCE = 0.02;
