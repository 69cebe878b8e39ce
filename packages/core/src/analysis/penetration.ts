/**
 * Penetration figures of a shot with conductive bodies: does the pulse get into the part?
 *
 *   equivalent frequency   f_eq = 1/(4·t_rise)          (a rise to peak in t_rise is a quarter period;
 *                                                          DOMAIN.md, common practice)
 *   skin depth             δ = √(2ρ/(ω·µ)),  ω = 2π·f_eq (any electromagnetics text; REFERENCES.md)
 *   diffusion time         τ = µ0·σ·a² (solid body of radius a) or µ0·σ·t·r/2 (tube wall), from
 *                          the fixture (magnetics/fixture.ts)
 *   centre / surface       H(part centre)/H(part surface) at the moment the surface field peaks,
 *                          from the waveform, and the ratio of the two peaks
 *   penetration            (peak at centre / peak at surface) ÷ (the same ratio with no eddy
 *                          currents, from the coil's field per ampere): 1 = fully penetrated
 *
 * A penetration below `threshold` (default 0.95) gives the warning `part.not-penetrated`. Bodies
 * are taken as non-magnetic (µ = µ0), as in the eddy model.
 */
import type { FixtureInfo } from '../magnetics/fixture.js';
import type { ShotResult, Warning } from '../model/result.js';
import type { Station } from '../model/station.js';
import { formatQuantity } from '../units/format.js';

const MU0 = 4e-7 * Math.PI;

/** Default penetration below which `part.not-penetrated` is raised. */
export const PENETRATION_WARN = 0.95;

/** Skin depth δ = √(2ρ/(ω·µ0·µr)) at frequency f, m. */
export function skinDepth_m(resistivity_Ohm_m: number, frequency_Hz: number, relativePermeability = 1): number {
  return Math.sqrt((2 * resistivity_Ohm_m) / (2 * Math.PI * frequency_Hz * MU0 * relativePermeability));
}

export interface BodyPenetration {
  name: string;
  isPart: boolean;
  /** Solid cylinder (size = radius) or tube (size = wall thickness). */
  solid: boolean;
  /** Skin depth at the equivalent frequency, m. */
  skinDepth_m: number;
  /** Radius (solid) or wall thickness (tube), m. */
  size_m: number;
  /** size / skin depth: well above 1 means the field stays near the surface during the rise. */
  sizeOverSkinDepth: number;
  diffusionTime_s: number;
  diffusionTimeBasis: string;
  /** Rise time / diffusion time: well above 1 means the field gets in. */
  riseOverDiffusion: number;
}

export interface PenetrationFigures {
  /** Time from firing to the coil current's peak, s. */
  riseTime_s: number;
  /** 1/(4·t_rise), Hz. */
  equivalentFrequency_Hz: number;
  bodies: BodyPenetration[];
  /** H(centre)/H(surface) at the moment the surface field peaks (null without both probes or a waveform). */
  centreToSurfaceAtPeak: number | null;
  /** Peak field at the centre / peak field at the surface (null without both probes). */
  centreToSurfacePeaks: number | null;
  /** The same ratio without eddy currents (coil field per ampere at the two points). */
  staticCentreToSurface: number | null;
  /** centreToSurfacePeaks / staticCentreToSurface: 1 when fully penetrated. */
  penetration: number | null;
  /** Time of the centre's peak minus time of the surface's peak, s. */
  centreLag_s: number | null;
  warnings: Warning[];
}

export interface PenetrationOptions {
  /** Penetration below which the warning is raised. Default PENETRATION_WARN. */
  threshold?: number;
  /** Probe names of the part's centre and surface (defaults: "part", "part surface"). */
  centreProbe?: string;
  surfaceProbe?: string;
}

/** Penetration figures of one shot. `fixture` is the info of buildFixture (bodies, probe points); omit for a station given by circuit numbers. */
export function penetrationFigures(station: Station, fixture: FixtureInfo | undefined, result: ShotResult, options: PenetrationOptions = {}): PenetrationFigures {
  const threshold = options.threshold ?? PENETRATION_WARN;
  const riseTime_s = result.figures.timeOfPeak_s;
  const f = riseTime_s > 0 ? 1 / (4 * riseTime_s) : NaN;
  const bodies: BodyPenetration[] = (fixture?.bodies ?? []).map((b) => {
    const solid = b.innerRadius_m === 0;
    const size = solid ? b.outerRadius_m : b.outerRadius_m - b.innerRadius_m;
    const delta = skinDepth_m(b.resistivity20_Ohm_m, f);
    return {
      name: b.name,
      isPart: b.isPart,
      solid,
      skinDepth_m: delta,
      size_m: size,
      sizeOverSkinDepth: size / delta,
      diffusionTime_s: b.diffusionTime_s,
      diffusionTimeBasis: b.diffusionTimeBasis,
      riseOverDiffusion: riseTime_s / b.diffusionTime_s,
    };
  });

  const ci = station.probes.findIndex((p) => p.name === (options.centreProbe ?? 'part'));
  const si = station.probes.findIndex((p) => p.name === (options.surfaceProbe ?? 'part surface'));
  let centreToSurfaceAtPeak: number | null = null;
  let centreToSurfacePeaks: number | null = null;
  let staticCentreToSurface: number | null = null;
  let penetration: number | null = null;
  let centreLag_s: number | null = null;
  if (ci >= 0 && si >= 0) {
    const pc = result.probes[ci];
    const ps = result.probes[si];
    if (pc && ps && ps.peakField_Apm !== 0) {
      centreToSurfacePeaks = pc.peakField_Apm / ps.peakField_Apm;
      centreLag_s = pc.timeOfPeak_s - ps.timeOfPeak_s;
    }
    const hs = result.waveform.field_Apm[si];
    const hc = result.waveform.field_Apm[ci];
    if (hs && hc && hs.length > 0) {
      let k = 0;
      for (let j = 1; j < hs.length; j++) if (Math.abs(hs[j]) > Math.abs(hs[k])) k = j;
      if (hs[k] !== 0) centreToSurfaceAtPeak = hc[k] / hs[k];
    }
    const sc = station.probes[si].coil_ApmPerA;
    if (sc !== 0) staticCentreToSurface = station.probes[ci].coil_ApmPerA / sc;
    if (centreToSurfacePeaks !== null && staticCentreToSurface !== null && staticCentreToSurface !== 0) penetration = centreToSurfacePeaks / staticCentreToSurface;
  }

  const warnings: Warning[] = [];
  if (penetration !== null && penetration < threshold) {
    const part = bodies.find((b) => b.isPart);
    const why = part
      ? ` The skin depth in the part at the equivalent frequency (${f.toPrecision(3)} Hz) is ${(part.skinDepth_m * 1e3).toPrecision(3)} mm against a ${part.solid ? 'radius' : 'wall thickness'} of ${(part.size_m * 1e3).toPrecision(3)} mm; its diffusion time is ${(part.diffusionTime_s * 1e3).toPrecision(3)} ms against a rise of ${(riseTime_s * 1e3).toPrecision(3)} ms.`
      : '';
    warnings.push({
      code: 'part.not-penetrated',
      severity: 'warning',
      message: `The field at the part's centre peaks at ${(100 * penetration).toFixed(1)} % of what the surface field would give without eddy currents (below ${(100 * threshold).toFixed(0)} %): eddy currents in the conductive bodies delay and weaken it${centreLag_s !== null ? ` (lag ${(centreLag_s * 1e6).toPrecision(3)} µs)` : ''}.${why} A longer pulse (more capacitance, more inductance) lets the field in.`,
    });
  }
  return {
    riseTime_s,
    equivalentFrequency_Hz: f,
    bodies,
    centreToSurfaceAtPeak,
    centreToSurfacePeaks,
    staticCentreToSurface,
    penetration,
    centreLag_s,
    warnings,
  };
}

/** Plain-text block of the penetration figures (for the shot summary). */
export function penetrationText(p: PenetrationFigures): string {
  const q = (v: number, unit: string) => formatQuantity(v, unit, { digits: 3 });
  const lines = ['Penetration of the field (eddy currents)', '----------------------------------------'];
  lines.push(`  rise time to peak current ${q(p.riseTime_s, 's')}; equivalent frequency 1/(4·t_rise) ${q(p.equivalentFrequency_Hz, 'Hz')}`);
  for (const b of p.bodies) {
    lines.push(
      `  ${b.name}: skin depth ${q(b.skinDepth_m, 'm')} against a ${b.solid ? 'radius' : 'wall'} of ${q(b.size_m, 'm')}; diffusion time ${q(b.diffusionTime_s, 's')} (${b.diffusionTimeBasis}), rise/diffusion ${b.riseOverDiffusion.toPrecision(3)}`,
    );
  }
  if (p.centreToSurfaceAtPeak !== null) lines.push(`  field at the part's centre / at its surface, when the surface field peaks: ${(100 * p.centreToSurfaceAtPeak).toFixed(1)} %`);
  if (p.penetration !== null) lines.push(`  penetration (peak ratio against the coil's own ratio ${p.staticCentreToSurface!.toFixed(3)}): ${(100 * p.penetration).toFixed(1)} %${p.centreLag_s !== null ? `, the centre peaks ${q(p.centreLag_s, 's')} after the surface` : ''}`);
  return lines.join('\n');
}
