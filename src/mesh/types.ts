/**
 * Data passed between the mesh layer and the 1-D solver: a fin's geometry as functions of the
 * position x (m from the base), and a mesh as plain read-only typed arrays.
 *
 * Units: lengths m, areas m^2. For annular fins x = r - innerRadius.
 */

/** Family of the 1-D geometry: straight fin (per its width), spine (pin) or annular (whole ring). */
export type FinShape1D = 'straight' | 'pin' | 'annular';

/**
 * Geometry of a fin for the 1-D model (thin-fin convention: the slope of the faces is neglected).
 * A(x) conducts, P(x) convects; both are exact functions of the profile.
 */
export interface FinGeometry1D {
  readonly shape: FinShape1D;
  /** Fin length L (annular: outerRadius - innerRadius), m. */
  readonly length: number;
  /** Cross-section area A(x) that conducts heat along the fin, m^2. */
  readonly area: (x: number) => number;
  /** Cooled perimeter P(x), m (straight: 2w + 2t with cooled edges, 2w insulated; pin: pi D; annular: 4 pi r). */
  readonly perimeter: (x: number) => number;
  /** Thickness (straight, annular) or diameter (pin) at x, m. */
  readonly size: (x: number) => number;
  /** A(0): the base area the fin covers, m^2. */
  readonly baseArea: number;
  /** A(L): the tip area (0 for a sharp tip), m^2. */
  readonly tipArea: number;
  /** Area of the cooled faces (and cooled edges), the integral of P over [0, L], m^2. Excludes the tip. */
  readonly faceArea: number;
  /** Positions where A or P has a kink, strictly increasing, first 0 and last L, m. */
  readonly breakpoints: Float64Array;
  /**
   * Near a sharp tip the size behaves like (L - x)^e; e is this exponent (1 triangle or cone,
   * 2 concave parabola, 1/2 convex parabola). 0 for a blunt tip (tipArea > 0).
   */
  readonly tipTaperExponent: number;
  /**
   * Exact integral of g(x) P(x) over [a, b] for g linear from gA at a to gB at b, m^2 times the
   * unit of g (with g = h: W/K). Exact to round-off for every profile of the contract.
   */
  readonly perimeterIntegral: (a: number, b: number, gA: number, gB: number) => number;
  /**
   * A(x) and P(x) as data (the profile's closed form), when the geometry came from one: the mesh builder evaluates
   * them at thousands of points at once through areaInto and perimeterInto (geometry1d.ts), with the same arithmetic
   * as `area` and `perimeter`, bit for bit. Absent for tabulated profiles and hand-made geometries (then the
   * builder calls the functions point by point).
   */
  readonly formula?: GeometryFormula;
  /**
   * A string that identifies A(x) and P(x) completely (profile kind, dimensions, edges), when the
   * geometry came from a case: equal keys give equal meshes, so buildMesh1D may reuse one.
   */
  readonly key?: string;
}

/**
 * The closed forms behind a geometry's A(x) and P(x) (geometry1d.ts): a straight fin or spine whose size is
 * tipSize + drop (max(0, 1 - x/L))^exponent (straight: A = width s, P = 2 width + edgeFactor s; pin: A = pi s^2 / 4,
 * P = pi s), or an annular fin (A = 2 pi (r1 + x) t, P = 4 pi (r1 + x)).
 */
export type GeometryFormula =
  | {
      readonly kind: 'tapered';
      readonly shape: 'straight' | 'pin';
      readonly length: number;
      readonly tipSize: number;
      readonly drop: number;
      readonly exponent: 0 | 0.5 | 1 | 2;
      readonly width: number;
      /** 2 when a straight fin's side edges convect, else 0. */
      readonly edgeFactor: number;
    }
  | { readonly kind: 'annular'; readonly innerRadius: number; readonly thickness: number };

/** Which end of the fin a graded grid refines. */
export type GradingEnd = 'base' | 'tip' | 'both';

/**
 * Node distribution inside a segment, as a map of the uniform parameter xi in [0, 1].
 * Both maps give nested grids when the number of cells doubles (even nodes stay put).
 */
export type Grading =
  | { kind: 'uniform' }
  /** Cells near the graded end shrink like xi^exponent (exponent >= 1). */
  | { kind: 'power'; toward: GradingEnd; exponent: number }
  /** Cell sizes grow geometrically away from the graded end; stretch = largest / smallest cell (> 1). */
  | { kind: 'geometric'; toward: GradingEnd; stretch: number };

/** What to mesh: the number of cells, the grading and extra positions that must be nodes. */
export interface Grid1DSpec {
  /** Cells of the unrefined grid, shared among the segments between breakpoints in proportion to length. */
  readonly cells: number;
  readonly grading?: Grading;
  /** Extra positions (m) that must be nodes, e.g. the kinks of a piecewise-linear h. */
  readonly breakpoints?: ArrayLike<number>;
  /** Integer factor multiplying every segment's cell count: refine = 2 gives the nested grid of half size. */
  readonly refine?: number;
}

/**
 * A vertex-centred 1-D mesh. Node i sits at x[i]; its control volume (CV) runs between the
 * interfaces at the midpoints of its neighbouring cells (half cells at the base and the tip).
 */
export interface Mesh1D {
  /** Number of nodes n (cells n - 1). */
  readonly nodes: number;
  /** Node positions, m, length n, x[0] = 0, x[n-1] = L. */
  readonly x: Float64Array;
  /** Cell lengths x[i+1] - x[i], m, length n - 1. */
  readonly dx: Float64Array;
  /** Cross-section area A at the interface (x[i] + x[i+1]) / 2 between CV i and CV i+1, m^2, length n - 1. */
  readonly interfaceArea: Float64Array;
  /** Cooled surface of each CV, the integral of P over the CV, m^2, length n. */
  readonly cvSurface: Float64Array;
  /**
   * Weights that turn nodal h into each CV's convective conductance for an h linear between nodes:
   * G_i = surfaceWeightPrev[i] h[i-1] + surfaceWeightSelf[i] h[i] + surfaceWeightNext[i] h[i+1], W/K.
   * Simpson's rule on each half cell (exact when P is at most quadratic within a cell), m^2.
   */
  readonly surfaceWeightPrev: Float64Array;
  readonly surfaceWeightSelf: Float64Array;
  readonly surfaceWeightNext: Float64Array;
  /** A(0), A(L), P(L) of the geometry, m^2, m^2, m. */
  readonly baseArea: number;
  readonly tipArea: number;
  readonly tipPerimeter: number;
  /** Fin length L, m. */
  readonly length: number;
  /** Representative cell size L / cells, m (the size used in grid-refinement studies). */
  readonly cellSize: number;
}
