// Minimal types for the general-purpose libraries the reference checks compare against.
declare module '2d-polygon-area' {
  /** Signed shoelace area of [x, y] points, in their squared units. */
  export default function area(points: readonly (readonly [number, number])[]): number;
}

declare module 'clipper-lib' {
  interface IntPoint {
    X: number;
    Y: number;
  }
  class ClipperOffset {
    constructor(miterLimit?: number, arcTolerance?: number);
    AddPath(path: IntPoint[], joinType: number, endType: number): void;
    Execute(solution: IntPoint[][], delta: number): void;
  }
  const ClipperLib: {
    ClipperOffset: typeof ClipperOffset;
    JoinType: { jtSquare: number; jtRound: number; jtMiter: number };
    EndType: { etClosedPolygon: number };
    Clipper: { Area(path: IntPoint[]): number };
  };
  export default ClipperLib;
}

// The Khronos glTF validator (npm gltf-validator): every normalised model is checked with it.
declare module 'gltf-validator' {
  interface ValidationMessage {
    code: string;
    message: string;
    /** 0 error, 1 warning, 2 information, 3 hint. */
    severity: number;
    pointer?: string;
  }
  interface ValidationReport {
    issues: { numErrors: number; numWarnings: number; messages: ValidationMessage[] };
  }
  export function validateBytes(data: Uint8Array, options?: { maxIssues?: number; uri?: string }): Promise<ValidationReport>;
}
