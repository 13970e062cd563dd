import { MeshBuilder } from './quad-mesh';

/** Node-placing helpers on the unit quarter disc; `m` = half the divisions across a ring. */
export class DiscDrawing {
  readonly mb = new MeshBuilder();

  constructor(readonly m: number) {}

  /** Angle ψMax(ρ) about the pole where the ring of radius ρ meets the surface (ψ = 0: down the axis). */
  psiMax(rho: number): number {
    return Math.PI / 2 - Math.asin(rho / 2);
  }

  /** A node at distance ρ and angle ψ from the pole. */
  polar(rho: number, psi: number): number {
    return this.mb.node(rho * Math.sin(psi), 1 - rho * Math.cos(psi));
  }

  /** A surface node at angle α from the axis. */
  surf(alpha: number): number {
    return this.mb.node(Math.sin(alpha), Math.cos(alpha));
  }

  /** Surface angle α of the point at chord distance `chord` from the pole. */
  alphaOf(chord: number): number {
    return 2 * Math.asin(chord / 2);
  }

  /** Straight line of `n` segments from existing node `a` to `b` (positions `t`, default uniform). */
  line(a: number, b: number, n: number, t?: Float64Array): number[] {
    const [ar, az] = this.mb.coords(a);
    const [br, bz] = this.mb.coords(b);
    const ids = [a];
    for (let i = 1; i < n; i++) {
      const s = t ? t[i] : i / n;
      ids.push(this.mb.node(ar + s * (br - ar), az + s * (bz - az)));
    }
    ids.push(b);
    return ids;
  }

  /** Surface nodes strictly between existing end nodes `a` (at angle a0) and `b` (at a1). */
  arc(a: number, b: number, a0: number, a1: number, n: number, t?: Float64Array): number[] {
    const ids = [a];
    for (let i = 1; i < n; i++) ids.push(this.surf(a0 + (t ? t[i] : i / n) * (a1 - a0)));
    ids.push(b);
    return ids;
  }

  /** The 2m + 1 nodes of the ring of radius ρ about the pole, from the axis to the surface. */
  ring(rho: number): number[] {
    const ids: number[] = [];
    const m = this.m;
    for (let j = 0; j <= 2 * m; j++) ids.push(this.polar(rho, (j / (2 * m)) * this.psiMax(rho)));
    return ids;
  }
}
