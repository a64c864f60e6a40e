// The readable report of a full analysis: band sweep, feed match, tolerance, pattern, trust.
import type { Analysis } from "../analysis/index.js";
import { feedLines, feedText } from "./feedText.js";
import { complexText, fixed, table } from "./format.js";

export function analysisText(a: Analysis): string {
  const out: string[] = [];
  const z0 = a.sweep.lineImpedanceOhm;
  out.push(`band sweep (SWR re ${z0} Ω; * marks frequencies inside the band)`);
  const rows = [["MHz", "impedance", "SWR", "gain dBi", "realized dBi"]];
  for (const p of a.sweep.points) {
    rows.push([`${p.inBand ? "*" : " "}${fixed(p.frequencyHz / 1e6, 3)}`, complexText(p.impedanceOhm), fixed(p.swr, 2), fixed(p.gainDbi, 2), fixed(p.realizedGainDbi, 2)]);
  }
  out.push(table(rows));
  const span = a.sweep.swr2Span;
  out.push(span ? `SWR ≤ 2 from ${fixed(span.lowHz / 1e6, 3)} to ${fixed(span.highHz / 1e6, 3)} MHz (${fixed(span.widthHz / 1e6, 3)} MHz${span.touchesSweepEdge ? ", at least: reaches the sweep edge" : ""})` : "SWR ≤ 2 nowhere near the design frequency");
  out.push("", ...feedLines(a.match));
  const t = a.tolerance;
  out.push(
    "",
    `tolerance (${t.samples} bent copies, σ ${t.bendSigmaDeg}° per bend, σ ${fixed(t.lengthSigmaFraction * 100, 2)} % per piece, seed ${t.seed}):`,
    `  gain dBi 5/50/95 %: ${fixed(t.gainDbi.p5, 2)} / ${fixed(t.gainDbi.p50, 2)} / ${fixed(t.gainDbi.p95, 2)} (nominal ${fixed(t.nominalGainDbi, 2)})${t.fragile ? "  FRAGILE: bend carefully" : ""}`,
    `  SWR 5/50/95 %: ${fixed(t.swr.p5, 2)} / ${fixed(t.swr.p50, 2)} / ${fixed(t.swr.p95, 2)}${t.failedSamples ? `; ${t.failedSamples} copies touched themselves` : ""}`,
  );
  if (a.feed) out.push("", feedText(a.feed));
  const p = a.pattern;
  const bw = (v: number | null) => (v === null ? "none (no half-power point)" : `${fixed(v, 1)}°`);
  out.push(
    "",
    "pattern:",
    `  ${p.words.lobe}`,
    `  half-power beamwidth: ${bw(p.beamwidthAlongPhiDeg)} along φ̂, ${bw(p.beamwidthAlongThetaDeg)} along θ̂; front-to-back ${fixed(p.frontToBackDb, 1)} dB`,
    `  polarization: ${p.polarization.sense}, tilt ${fixed(p.polarization.tiltDeg, 1)}° from θ̂, axial ratio ${fixed(p.polarization.axialRatioDb, 1)} dB`,
    `  ${p.words.mounting}`,
  );
  const c = a.checks;
  out.push(
    "",
    `trust: figures at ${c.segmentsPerWavelength[0]} segments per λ; against ${c.segmentsPerWavelength[1]} per λ gain moves ${fixed(c.gainChangeDb, 3)} dB and impedance ${fixed(c.impedanceChangeOhm, 2)} Ω (${fixed(a.design.uncertainty.impedancePercent, 2)} %); energy balance error ${c.energyBalanceError.toExponential(2)}`,
  );
  return out.join("\n");
}
