// Far field of piecewise-linear currents on straight segments, in closed form (no quadrature).
// Radiation vector N(r̂) = Σ_s L_s ŝ_s ∫_0^1 [I1(1−t) + I2 t] e^{j(ψ1 + αt)} dt, ψ = k r̂·r, α = ψ2 − ψ1:
//   ∫_0^1 e^{j(ψ1+αt)} dt   = A0 = (E2 − E1)/(jα),
//   ∫_0^1 t e^{j(ψ1+αt)} dt = A1 = E2/(jα) + (E2 − E1)/α²,   E = e^{jψ}  (Taylor series for small α),
// so the segment adds L ŝ [I1 A0 + (I2 − I1) A1]. With e^{jωt} time dependence
//   r·E = −jωμ/(4π) N⊥ e^{−jkr},  U = r²|E|²/(2η) = k²η/(32π²) (|Nθ|² + |Nφ|²)
// (Balanis, Antenna Theory, 3rd ed., §12.3 and eq. 2-12a). Angles as in ISO 80000-2.
// Node phases by recurrence: the nodes of one straight piece are equally spaced, r_i = r_0 + i·Δ, so
// E_i = e^{jψ_i} = E_0·w^i with w = e^{jkr̂·Δ}: two sin/cos pairs per piece instead of one per node
// (the angle-addition formula, e^{j(a+b)} = e^{ja}e^{jb}); rounding grows about i·2⁻⁵³, ~1e-14 here.
import { ETA0_OHM } from "../units.js";
import { segmentEndCurrents, type Mesh } from "./mesh.js";

export interface FarFieldPlan {
  nodeCount: number;
  nodeXyz: Float64Array;
  segStartNode: Int32Array;
  segEndNode: Int32Array;
  /** L·ŝ per segment, xyz interleaved. */
  segVec: Float64Array;
  /** Node currents I1 (start) and I2 (end) per segment: [re1, im1, re2, im2]. */
  segCurrent: Float64Array;
  kRadPerM: number;
  /** True when every node has z = 0: |E| is then mirror-symmetric about the x–y plane. */
  planarXy: boolean;
  phaseRe: Float64Array;
  phaseIm: Float64Array;
  /** Straight runs of equally spaced nodes: first node, node count, step Δ (xyz interleaved). */
  runFirstNode: Int32Array;
  runNodeCount: Int32Array;
  runStep: Float64Array;
}

export function createFarFieldPlan(mesh: Mesh, re: Float64Array, im: Float64Array, kRadPerM: number): FarFieldPlan {
  const ns = mesh.segmentCount;
  const xyz: number[] = [];
  const segStartNode = new Int32Array(ns);
  const segEndNode = new Int32Array(ns);
  const segVec = new Float64Array(3 * ns);
  const segCurrent = new Float64Array(4 * ns);
  let planarXy = true;
  for (let s = 0; s < ns; s++) {
    const x0 = mesh.start[3 * s], y0 = mesh.start[3 * s + 1], z0 = mesh.start[3 * s + 2];
    const len = mesh.lengthM[s];
    for (let c = 0; c < 3; c++) segVec[3 * s + c] = mesh.dir[3 * s + c] * len;
    const continues = s > 0 && mesh.wireOf[s - 1] === mesh.wireOf[s];
    if (!continues) xyz.push(x0, y0, z0);
    segStartNode[s] = xyz.length / 3 - 1;
    xyz.push(x0 + segVec[3 * s], y0 + segVec[3 * s + 1], z0 + segVec[3 * s + 2]);
    segEndNode[s] = xyz.length / 3 - 1;
    const [r1, i1, r2, i2] = segmentEndCurrents(mesh, s, re, im);
    segCurrent.set([r1, i1, r2, i2], 4 * s);
    if (Math.abs(z0) > 1e-12 || Math.abs(z0 + segVec[3 * s + 2]) > 1e-12) planarXy = false;
  }
  const nodeCount = xyz.length / 3;
  // runs: consecutive segments of one piece of one wire with the same length (the feed's finer
  // segments, mesh.ts, start runs of their own), so their nodes are equally spaced
  const runFirst: number[] = [], runCount: number[] = [], runStep: number[] = [];
  for (let s = 0; s < ns; s++) {
    const sameRun = s > 0 && mesh.wireOf[s - 1] === mesh.wireOf[s] && mesh.pieceOf[s - 1] === mesh.pieceOf[s]
      && Math.abs(mesh.lengthM[s] - mesh.lengthM[s - 1]) <= 1e-12 * mesh.lengthM[s];
    if (sameRun) { runCount[runCount.length - 1] += 1; continue; }
    runFirst.push(segStartNode[s]);
    runCount.push(2);
    runStep.push(segVec[3 * s], segVec[3 * s + 1], segVec[3 * s + 2]);
  }
  return {
    nodeCount,
    nodeXyz: Float64Array.from(xyz),
    segStartNode,
    segEndNode,
    segVec,
    segCurrent,
    kRadPerM,
    planarXy,
    phaseRe: new Float64Array(nodeCount),
    phaseIm: new Float64Array(nodeCount),
    runFirstNode: Int32Array.from(runFirst),
    runNodeCount: Int32Array.from(runCount),
    runStep: Float64Array.from(runStep),
  };
}

/**
 * r·E in the θ̂ and φ̂ directions at (θ, φ), written into out = [Eθre, Eθim, Eφre, Eφim] (V).
 * The plan's phase buffers are scratch space: one plan per thread.
 */
export function farFieldAt(plan: FarFieldPlan, thetaRad: number, phiRad: number, out: Float64Array): void {
  const st = Math.sin(thetaRad), ct = Math.cos(thetaRad);
  const sp = Math.sin(phiRad), cp = Math.cos(phiRad);
  const ux = st * cp, uy = st * sp, uz = ct;
  const k = plan.kRadPerM;
  const { nodeXyz, phaseRe, phaseIm } = plan;
  const { runFirstNode, runNodeCount, runStep } = plan;
  for (let r = 0; r < runFirstNode.length; r++) {
    const i0 = runFirstNode[r];
    const psi = k * (ux * nodeXyz[3 * i0] + uy * nodeXyz[3 * i0 + 1] + uz * nodeXyz[3 * i0 + 2]);
    const step = k * (ux * runStep[3 * r] + uy * runStep[3 * r + 1] + uz * runStep[3 * r + 2]);
    const wr = Math.cos(step), wi = Math.sin(step);
    let er = Math.cos(psi), ei = Math.sin(psi);
    phaseRe[i0] = er;
    phaseIm[i0] = ei;
    for (let i = i0 + 1; i < i0 + runNodeCount[r]; i++) { // E_{i+1} = E_i·w
      const t = er * wr - ei * wi;
      ei = er * wi + ei * wr;
      er = t;
      phaseRe[i] = er;
      phaseIm[i] = ei;
    }
  }
  let nxr = 0, nxi = 0, nyr = 0, nyi = 0, nzr = 0, nzi = 0;
  const { segVec, segCurrent, segStartNode, segEndNode } = plan;
  const ns = segStartNode.length;
  for (let s = 0; s < ns; s++) {
    const vx = segVec[3 * s], vy = segVec[3 * s + 1], vz = segVec[3 * s + 2];
    const alpha = k * (ux * vx + uy * vy + uz * vz);
    const a = segStartNode[s], b = segEndNode[s];
    const e1r = phaseRe[a], e1i = phaseIm[a], e2r = phaseRe[b], e2i = phaseIm[b];
    let a0r: number, a0i: number, a1r: number, a1i: number;
    if (Math.abs(alpha) > 1e-3) {
      const dr = e2r - e1r, di = e2i - e1i;
      // A0 = (E2−E1)/(jα) = −j(E2−E1)/α
      a0r = di / alpha;
      a0i = -dr / alpha;
      // A1 = −jE2/α + (E2−E1)/α²
      const inv2 = 1 / (alpha * alpha);
      a1r = e2i / alpha + dr * inv2;
      a1i = -e2r / alpha + di * inv2;
    } else {
      // series: A0 = E1(1 + jα/2 − α²/6), A1 = E1(1/2 + jα/3 − α²/8)
      const s0r = 1 - (alpha * alpha) / 6, s0i = alpha / 2;
      const s1r = 0.5 - (alpha * alpha) / 8, s1i = alpha / 3;
      a0r = e1r * s0r - e1i * s0i; a0i = e1r * s0i + e1i * s0r;
      a1r = e1r * s1r - e1i * s1i; a1i = e1r * s1i + e1i * s1r;
    }
    const i1r = segCurrent[4 * s], i1i = segCurrent[4 * s + 1];
    const dIr = segCurrent[4 * s + 2] - i1r, dIi = segCurrent[4 * s + 3] - i1i;
    // I1·A0 + (I2−I1)·A1
    const fr = i1r * a0r - i1i * a0i + dIr * a1r - dIi * a1i;
    const fi = i1r * a0i + i1i * a0r + dIr * a1i + dIi * a1r;
    nxr += vx * fr; nxi += vx * fi;
    nyr += vy * fr; nyi += vy * fi;
    nzr += vz * fr; nzi += vz * fi;
  }
  // N⊥ components: θ̂ = (cθcφ, cθsφ, −sθ), φ̂ = (−sφ, cφ, 0)
  const ntr = ct * cp * nxr + ct * sp * nyr - st * nzr;
  const nti = ct * cp * nxi + ct * sp * nyi - st * nzi;
  const npr = -sp * nxr + cp * nyr;
  const npi = -sp * nxi + cp * nyi;
  // r·E = −j(kη/4π) N
  const c = (k * ETA0_OHM) / (4 * Math.PI);
  out[0] = c * nti; out[1] = -c * ntr;
  out[2] = c * npi; out[3] = -c * npr;
}

/** Radiation intensity U(θ, φ) = r²|E|²/(2η) in W/sr. */
export function intensityAt(plan: FarFieldPlan, thetaRad: number, phiRad: number, scratch: Float64Array): number {
  farFieldAt(plan, thetaRad, phiRad, scratch);
  return (scratch[0] ** 2 + scratch[1] ** 2 + scratch[2] ** 2 + scratch[3] ** 2) / (2 * ETA0_OHM);
}
