// Minimal typings for the parts of clipper-lib 6.4.2 (Clipper 1 JS port) used by the cores.
declare module 'clipper-lib' {
  interface IntPoint {
    X: number;
    Y: number;
  }
  type Path = IntPoint[];
  type Paths = Path[];
  class Clipper {
    AddPath(path: Path, polyType: number, closed: boolean): boolean;
    AddPaths(paths: Paths, polyType: number, closed: boolean): boolean;
    Execute(clipType: number, solution: Paths, subjFill: number, clipFill: number): boolean;
    static Area(path: Path): number;
    static Orientation(path: Path): boolean;
    static Minkowski(pattern: Path, path: Path, isSum: boolean, isClosed: boolean): Paths;
    static CleanPolygons(paths: Paths, distance: number): Paths;
  }
  class ClipperOffset {
    constructor(miterLimit?: number, arcTolerance?: number);
    AddPath(path: Path, joinType: number, endType: number): void;
    Execute(solution: Paths, delta: number): void;
  }
  const ClipperLib: {
    Clipper: typeof Clipper;
    ClipperOffset: typeof ClipperOffset;
    PolyType: { ptSubject: number; ptClip: number };
    ClipType: { ctIntersection: number; ctUnion: number; ctDifference: number; ctXor: number };
    PolyFillType: { pftEvenOdd: number; pftNonZero: number; pftPositive: number; pftNegative: number };
    JoinType: { jtSquare: number; jtRound: number; jtMiter: number };
    EndType: { etClosedPolygon: number; etClosedLine: number; etOpenButt: number };
  };
  export default ClipperLib;
  export type { IntPoint, Path, Paths };
}
