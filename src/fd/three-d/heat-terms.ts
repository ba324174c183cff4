/**
 * The heat terms of a 3-D sink system, kept as data beside the matrix so that every heat rate is computed from
 * the same conductances: losses (node, conductance G, the fixed excess it leads to, owner: a fin's index or
 * PLATE_TOP / UNDERSIDE) and the root junctions between plate top cells and fins' first nodes (two half-cell
 * conductances in series). Heat of a loss: G (theta − theta_fixed), W; of a junction: (theta_P − theta_fin) / (1/G_p + 1/G_f).
 * A loss is a surface conductance G_s (h A: the face to the fixed temperature; Infinity for a prescribed
 * temperature) in series with a half cell G_h (node to face; Infinity where the node sits on the face, as a
 * thin fin's sheet node does), G = 1/(1/G_s + 1/G_h); `law` marks the faces whose h follows the fins' power
 * law (sink-newton.ts evaluates those faces' flux with the law).
 */
import type { ConductanceBuilder } from '../linear-algebra/csr.js';

/** Owners of loss terms that are not fins. */
export const PLATE_TOP = -1;
export const UNDERSIDE = -2;

export interface HeatTerms {
  node: Int32Array;
  g: Float64Array;
  /** theta of the fixed temperature the term leads to (0: the ambient; a prescribed tip: its excess). */
  fixed: Float64Array;
  owner: Int32Array;
  /** The two parts of G (see above), W/K. */
  surface: Float64Array;
  half: Float64Array;
  /** 1 where the face's h is the fins' h (the power law applies), 0 for the plate's h and prescribed temperatures. */
  law: Uint8Array;
}

/** Where a loss's h comes from: the fins' h (power law if the case has one) or a linear h (plate, given tip h). */
export type LossLaw = 'fin-h' | 'linear';

export interface RootTerms {
  plate: Int32Array;
  fin: Int32Array;
  /** The half plate cell's and the fin's half layer's conductances (in series). */
  gPlate: Float64Array;
  gFin: Float64Array;
  owner: Int32Array;
}

/** Growing lists of heat terms during assembly. */
export class TermLists {
  readonly lossNode: number[] = [];
  readonly lossG: number[] = [];
  readonly lossFixed: number[] = [];
  readonly lossOwner: number[] = [];
  readonly lossSurface: number[] = [];
  readonly lossHalf: number[] = [];
  readonly lossLaw: number[] = [];
  readonly rootPlate: number[] = [];
  readonly rootFin: number[] = [];
  readonly rootGPlate: number[] = [];
  readonly rootGFin: number[] = [];
  readonly rootOwner: number[] = [];

  constructor(
    private readonly builder: ConductanceBuilder,
    private readonly rhs: Float64Array,
  ) {}

  /**
   * A surface conductance `surface` (h A; Infinity: a prescribed temperature) in series with a half cell `half`
   * (Infinity: none) from `node` to the fixed excess `fixed` (0: ambient), counted as a loss of `owner`.
   */
  loss(node: number, surface: number, half: number, owner: number, law: LossLaw, fixed = 0): void {
    const g = half === Infinity ? surface : surface === Infinity ? half : 1 / (1 / surface + 1 / half);
    if (!(g > 0)) return;
    this.builder.addToDiagonal(node, g);
    if (fixed !== 0) this.rhs[node] += g * fixed;
    this.lossNode.push(node);
    this.lossG.push(g);
    this.lossFixed.push(fixed);
    this.lossOwner.push(owner);
    this.lossSurface.push(surface);
    this.lossHalf.push(half);
    this.lossLaw.push(law === 'fin-h' ? 1 : 0);
  }

  /** The series junction of a plate top cell and a fin's first node. */
  root(plate: number, fin: number, gPlate: number, gFin: number, owner: number): void {
    this.builder.couple(plate, fin, 1 / (1 / gPlate + 1 / gFin));
    this.rootPlate.push(plate);
    this.rootFin.push(fin);
    this.rootGPlate.push(gPlate);
    this.rootGFin.push(gFin);
    this.rootOwner.push(owner);
  }
}

/** What a fin assembly hands back: its extra lines and the fin nodes that continue a plate column's line. */
export interface FinAssembly {
  lines: number[][];
  columnAbove(i: number, j: number): number[] | null;
}
