import { describe, expect, it } from 'vitest';
import { isPositiveDefinite } from '../design/to-station.js';
import { BODY_METALS } from './body-materials.js';
import { nagaokaCoefficient } from './formulas.js';
import { MU0_HpM } from './constants.js';
import { filamentMutual_H } from './mutual.js';
import { gaussLegendreOn } from './quadrature.js';
import { cellField } from './ring-cell.js';
import { buildShellNetwork, coilBodyMutuals, gradedEdges, loopFieldsAt, meshBody } from './shells.js';
import type { WindingLayer } from './winding.js';

const cu = BODY_METALS.copper;

describe('gradedEdges / meshBody', () => {
  it('equal shells for q = 1; with q = 1.25 each shell is 1.25 × the one outside it and they fill the radius', () => {
    expect(gradedEdges(0, 1, 4, 1)).toEqual([0, 0.25, 0.5, 0.75, 1]);
    const e = gradedEdges(0.002, 0.01, 6, 1.25);
    expect(e[0]).toBe(0.002);
    expect(e[6]).toBe(0.01);
    for (let k = 1; k < 5; k++) expect((e[6 - k] - e[5 - k]) / (e[7 - k] - e[6 - k])).toBeCloseTo(1.25, 10);
  });

  it('numbers cells slice by slice from the outer shell, with names that say shell (r1 = surface) and slice', () => {
    const m = meshBody({ name: 'part', innerRadius_m: 0, outerRadius_m: 0.01, length_m: 0.02, material: cu, radialShells: 3, axialSlices: 2 });
    expect(m.cells.length).toBe(6);
    expect(m.cells[0]).toMatchObject({ shell: 1, slice: 1 });
    expect(m.cells[0].cell.x2).toBe(0.01);
    expect(m.cells[5]).toMatchObject({ shell: 3, slice: 2 });
    expect(m.cells[5].cell.x1).toBe(0);
    const net = buildShellNetwork([m], []);
    expect(net.loops.map((l) => l.name)).toEqual(['part r1 z1', 'part r2 z1', 'part r3 z1', 'part r1 z2', 'part r2 z2', 'part r3 z2']);
  });
});

describe('buildShellNetwork: loops of a body', () => {
  it('R = ρ·2π·r_m/(Δr·Δz) and C = density·c_p·π(r2² − r1²)·Δz for each cell (uniform current density; closed form)', () => {
    const m = meshBody({ name: 's', innerRadius_m: 0.02, outerRadius_m: 0.024, length_m: 0.01, material: cu, radialShells: 2, axialSlices: 1 });
    const l = buildShellNetwork([m], []).loops[1]; // inner shell: 20–22 mm
    expect(l.resistance20_Ohm).toBeCloseTo((1.7241e-8 * 2 * Math.PI * 0.021) / (0.002 * 0.01), 15);
    expect(l.heatCapacity_JpK).toBeCloseTo(8890 * 385 * Math.PI * (0.022 ** 2 - 0.02 ** 2) * 0.01, 10);
  });

  // A thin copper tube, 0.05 mm wall at 20 mm radius, 30 mm long, inside a 600 mm sheet solenoid of 6000 turns.
  const coil: WindingLayer[] = [{ radius_m: 0.03, z0_m: -0.3 + 0.00005, pitch_m: 0.0001, turns: 6000, sign: 1, gmd_m: 1e-5 }];
  const ri = 0.01995;
  const t = 0.00005;
  const r = ri + t / 2;
  const tube = meshBody({ name: 'tube', innerRadius_m: ri, outerRadius_m: ri + t, length_m: 0.03, material: cu, radialShells: 1, axialSlices: 1 });
  const net = buildShellNetwork([tube], coil);
  const loop = net.loops[0];

  it('mutual to a solenoid 20 × longer: µ0·H·π·⟨r²⟩ with H = (N/ℓ)·cos θ at its centre (sheet solenoid on its axis), within 1e-3 (field variation over the tube)', () => {
    const meanR2 = ((ri + t) ** 3 - ri ** 3) / (3 * t);
    const H = (6000 / 0.6) * (0.3 / Math.hypot(0.3, 0.03));
    expect(loop.mutualToCoil_H / (MU0_HpM * H * Math.PI * meanR2)).toBeCloseTo(1, 3);
  });

  it("self of a thin tube: Nagaoka's sheet inductance K_N·µ0·π·r²/ℓ (Grover Table 36 closed form) within 0.3 % (the wall's own thickness, t/r = 0.25 %, lowers it by about (2/3)·t/r)", () => {
    expect(Math.abs(loop.inductance_H / ((nagaokaCoefficient((2 * r) / 0.03) * MU0_HpM * Math.PI * r * r) / 0.03) - 1)).toBeLessThan(3e-3);
  });

  it('its L/R time is K_N·µ0·σ·r·t/2, the shielding time of a thin wall (closed form from the two above), within 0.3 %', () => {
    const tau = (nagaokaCoefficient((2 * r) / 0.03) * MU0_HpM * r * t) / (2 * 1.7241e-8);
    expect(Math.abs(loop.inductance_H / loop.resistance20_Ohm / tau - 1)).toBeLessThan(3e-3);
  });

  it('coil coupling by lattice sums equals the direct sum over turns of the Gauss-averaged flux (2e-6: cubic interpolation in z and r²)', () => {
    const small: WindingLayer[] = [
      { radius_m: 0.014, z0_m: -0.0195, pitch_m: 0.001, turns: 40, sign: 1, gmd_m: 3e-4 },
      { radius_m: 0.015, z0_m: -0.0195, pitch_m: 0.001, turns: 40, sign: 1, gmd_m: 3e-4 },
    ];
    const m = meshBody({ name: 'p', innerRadius_m: 0, outerRadius_m: 0.01, length_m: 0.02, material: cu, radialShells: 4, axialSlices: 2 });
    const fast = coilBodyMutuals(small, m).mutual_H;
    for (const idx of [0, 3, 5]) {
      const c = m.cells[idx].cell;
      const gr = gaussLegendreOn(6, c.x1, c.x2);
      const gz = gaussLegendreOn(8, c.y1, c.y2);
      let s = 0;
      for (let i = 0; i < 6; i++)
        for (let j = 0; j < 8; j++)
          for (const L of small) for (let t = 0; t < L.turns; t++) s += gr.w[i] * gz.w[j] * filamentMutual_H(L.radius_m, gr.x[i], gz.x[j] - (L.z0_m + t * L.pitch_m));
      s /= (c.x2 - c.x1) * (c.y2 - c.y1);
      expect(Math.abs(fast[idx] / s - 1)).toBeLessThan(2e-6);
    }
  });

  it('the loop inductance matrix of a solid part (16 shells × 2 slices, with its core) is symmetric and positive definite (passive conductors store positive energy)', () => {
    const m = meshBody({ name: 'p', innerRadius_m: 0, outerRadius_m: 0.01, length_m: 0.02, material: cu, radialShells: 16, axialSlices: 2 });
    const n2 = buildShellNetwork([m], []);
    for (let i = 0; i < n2.L.length; i++) for (let j = 0; j < i; j++) expect(n2.L[i][j]).toBe(n2.L[j][i]);
    expect(isPositiveDefinite(n2.L)).toBe(true);
  });

  it('loopFieldsAt gives each cell’s own field per ampere', () => {
    expect(loopFieldsAt(net, 0, 0.001)[0]).toBe(cellField(loop.cell, 0, 0.001).hz);
  });
});
