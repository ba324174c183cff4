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

/** A typed array that grows by doubling (assembly lists kept off the JS heap: no garbage-collector marking). */
class Growing<T extends Float64Array | Int32Array | Uint8Array> {
  private data: T;
  private count = 0;

  constructor(private readonly make: (size: number) => T) {
    this.data = make(1024);
  }

  push(value: number): void {
    if (this.count === this.data.length) {
      const bigger = this.make(2 * this.count);
      bigger.set(this.data);
      this.data = bigger;
    }
    this.data[this.count++] = value;
  }

  /** The values pushed, in a typed array of their exact length. */
  values(): T {
    return this.data.slice(0, this.count) as T;
  }
}

const f64 = (size: number) => new Float64Array(size);
const i32 = (size: number) => new Int32Array(size);

/** Growing lists of heat terms during assembly. */
export class TermLists {
  private readonly lossNode = new Growing(i32);
  private readonly lossG = new Growing(f64);
  private readonly lossFixed = new Growing(f64);
  private readonly lossOwner = new Growing(i32);
  private readonly lossSurface = new Growing(f64);
  private readonly lossHalf = new Growing(f64);
  private readonly lossLaw = new Growing((size) => new Uint8Array(size));
  private readonly rootPlate = new Growing(i32);
  private readonly rootFin = new Growing(i32);
  private readonly rootGPlate = new Growing(f64);
  private readonly rootGFin = new Growing(f64);
  private readonly rootOwner = new Growing(i32);

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

  losses(): HeatTerms {
    return {
      node: this.lossNode.values(),
      g: this.lossG.values(),
      fixed: this.lossFixed.values(),
      owner: this.lossOwner.values(),
      surface: this.lossSurface.values(),
      half: this.lossHalf.values(),
      law: this.lossLaw.values(),
    };
  }

  roots(): RootTerms {
    return {
      plate: this.rootPlate.values(),
      fin: this.rootFin.values(),
      gPlate: this.rootGPlate.values(),
      gFin: this.rootGFin.values(),
      owner: this.rootOwner.values(),
    };
  }
}

/** What a fin assembly hands back: its extra lines and the fin nodes that continue a plate column's line. */
export interface FinAssembly {
  lines: number[][];
  columnAbove(i: number, j: number): number[] | null;
}
