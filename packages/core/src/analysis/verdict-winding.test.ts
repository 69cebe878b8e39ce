import { describe, expect, it } from 'vitest';
import { MU0_HpM } from '../magnetics/constants.js';
import { magneticPressure_Pa } from './forces.js';
import { judgeWinding, windingField } from './verdict-winding.js';
import { byId, fixtureResult, fixtureStation } from './verdict-fixtures.test-util.js';


describe('judgeWinding', () => {
  it('windingField takes the largest of the probes, the figures and the coil-only field at peak current', () => {
    const st = fixtureStation(); // probe 0: 95 (A/m)/A
    // 30 kA × 95 = 2.85 MA/m equals the figure; a probe at 3.1 MA/m wins
    const r = fixtureResult({ probes: [{ name: 'part', peakField_Apm: 2.85e6, timeOfPeak_s: 0 }, { name: 'bore wall', peakField_Apm: 3.1e6, timeOfPeak_s: 0 }] });
    expect(windingField(st, r)).toMatchObject({ field_Apm: 3.1e6 });
    // eddy-shielded part: 2.0 MA/m at the part, but the coil alone makes 2.85 MA/m
    const shielded = fixtureResult({ figures: { peakField_Apm: 2.0e6 }, probes: [{ name: 'part', peakField_Apm: 2.0e6, timeOfPeak_s: 0 }] });
    const w = windingField(st, shielded);
    expect(w.field_Apm).toBeCloseTo(2.85e6, 3);
    expect(w.basis).toMatch(/coil-only/);
  });

  // REFERENCES.md: p = B²/(2µ0), 397.9 kPa at 1 T.
  it('winding.pressure is info with p = B²/(2µ0); 1 T given as the winding field gives 397.9 kPa', () => {
    const items = judgeWinding(fixtureStation(), fixtureResult(), { windingField_Apm: 1 / MU0_HpM });
    const p = byId(items, 'winding.pressure');
    expect(p.status).toBe('info');
    expect(p.value / 1e3).toBeCloseTo(397.9, 1);
    expect(items).toHaveLength(1); // no geometry: stress not judged
  });

  it('winding.hoop-stress: p·r_o/t against the Smithells proof stress with the safety factor (pass, warn, fail)', () => {
    const B = 2.85e6 * MU0_HpM;
    const p = magneticPressure_Pa(B); // ≈ 5.10 MPa
    const at = (r: number, t: number, extra = {}) => byId(judgeWinding(fixtureStation(), fixtureResult(), { windingRadius_m: r, windingThickness_m: t, ...extra }), 'winding.hoop-stress');
    const ok = at(0.02, 0.02); // σ = p·0.03/0.02 ≈ 7.7 MPa < 50/2 MPa
    expect(ok.value).toBeCloseTo((p * 0.03) / 0.02, 0);
    expect(ok).toMatchObject({ status: 'pass', limit: 50e6, unit: 'Pa' });
    expect(ok.note).toMatch(/Smithells/);
    expect(at(0.03, 0.005).status).toBe('warn'); // σ = p·0.0325/0.005 ≈ 33 MPa: inside 50 MPa, short of SF 2
    expect(at(0.03, 0.003).status).toBe('fail'); // σ = p·0.0315/0.003 ≈ 54 MPa > 50 MPa
    expect(at(0.03, 0.003, { temper: 'hard' })).toMatchObject({ status: 'pass', limit: 265e6 });
    expect(at(0.03, 0.003, { proofStress_Pa: 60e6, safetyFactor: 1 }).status).toBe('pass');
  });

  it('winding.hoop-stress uses the aluminium value (from memory) for an aluminium coil', () => {
    const st = fixtureStation();
    st.coil = { ...st.coil, conductor: 'aluminium' };
    const s = byId(judgeWinding(st, fixtureResult(), { windingRadius_m: 0.02, windingThickness_m: 0.02 }), 'winding.hoop-stress');
    expect(s.limit).toBe(28e6);
    expect(s.note).toMatch(/from memory/);
  });
});
