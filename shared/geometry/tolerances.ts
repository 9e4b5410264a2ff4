// Named tolerances for plan geometry. Plan lengths are millimetres; a tape measure reads to about
// 1 mm, so anything much finer than that is noise from arithmetic, not from the room.

/** Two plan points closer than this (mm) are the same point. */
export const POINT_TOLERANCE_MM = 0.01;
/** A wall shorter than this (mm) has zero length for the designer. */
export const MIN_WALL_LENGTH_MM = 1;
/** Two walls whose directions differ by less than this sine (about 0.06°) count as parallel. */
export const PARALLEL_SINE_TOLERANCE = 1e-3;
/** A mitred outer corner further than this many wall thicknesses from its inside corner is cut square (bevelled) instead. */
export const MITRE_LIMIT_THICKNESSES = 6;
/** Openings stay this far (mm) from each end of their wall so the frame has room (common practice, no source). */
export const CORNER_MARGIN_MM = 50;
/** Two openings on one wall may touch but not overlap by more than this (mm). */
export const OPENING_OVERLAP_TOLERANCE_MM = 0.5;
