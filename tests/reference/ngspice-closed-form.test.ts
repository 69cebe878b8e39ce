/**
 * ngspice against the closed forms: ties the independent simulator (and our deck of a Station, see
 * tests/support/ngspice.ts) to the textbook solutions before it is used to judge fluxkick
 * (tests/reference/ngspice-engine.test.ts).
 *
 * Sources: series RLC natural response and first-order RL decay, Nilsson & Riedel, Electric Circuits (REFERENCES.md).
 * ngspice runs with RELTOL = 1e-6 and a maximum step of a 2000th of the pulse.
 * Tolerances: 1e-5 relative for peak current and waveform (ten times RELTOL: the local-error control of the
 * trapezoidal rule lets errors add up over the steps of the pulse); 1e-4 relative for times read off the sampled
 * output (the peak is flat: its time is found from a parabola through three output samples).
 */
import { describe, expect, test } from 'vitest';
import { ngspiceStatus, refinedPeak, runNgspice, sampleAt, stationDeck, stationTraces, wrdataTraces, parseWrdata, MIN_RON_OHM, SNUBBER_C_F, NgspiceError, capacitanceSweepDeck, parseSweep } from '../support/ngspice.js';
import { freewheelCurrent_A, makeStation, seriesRlc, seriesTotals } from './ngspice-circuits.js';

const ng = ngspiceStatus();
if (!ng.path) {
  if (ng.required) test('ngspice is installed (required on CI)', () => expect.fail(ng.message));
  else console.warn(`[skip] ${ng.message}`);
}

describe('wrdata parsing (tests/support/ngspice.ts)', () => {
  test('parseWrdata reads whitespace-separated exponent columns and rejects text', () => {
    const rows = parseWrdata(' 0.00000000e+00  1.5e-3 \n 1.0e-06 -2.5e+00\n\n');
    expect(rows).toEqual([
      [0, 1.5e-3],
      [1e-6, -2.5],
    ]);
    expect(() => parseWrdata('0 abc')).toThrow(/not a number/);
  });
  test('wrdataTraces splits vectors into (scale, value) pairs and appended analyses into blocks', () => {
    const text = '0 1 0 10\n1 2 1 20\n0 3 0 30\n1 4 1 40\n';
    const blocks = wrdataTraces(text, ['a', 'b']);
    expect(blocks).toHaveLength(2);
    expect(blocks[0].a).toEqual({ t_s: [0, 1], y: [1, 2] });
    expect(blocks[1].b).toEqual({ t_s: [0, 1], y: [30, 40] });
  });
  test('refinedPeak finds the vertex of a sampled parabola exactly', () => {
    const t = [0, 1, 2, 3, 4];
    const y = t.map((x) => 5 - (x - 1.7) ** 2);
    const p = refinedPeak({ t_s: t, y });
    expect(p.time_s).toBeCloseTo(1.7, 12);
    expect(p.peak).toBeCloseTo(5, 12);
  });
});

describe.skipIf(!ng.path)('runNgspice (tests/support/ngspice.ts)', () => {
  test('a deck ngspice rejects raises NgspiceError carrying the log', () => {
    const deck = 'bad deck\nC1 a 0 1u IC=1\nXfoo a b nosuch\n.tran 1u 1m uic\n.control\nrun\nquit\n.endc\n.end\n';
    expect(() => runNgspice(deck)).toThrow(/unknown subckt/);
  });
  test('a run stopped by "timestep too small" raises NgspiceError (no silent truncated waveform)', () => {
    // A forward-only device turning off into 1e9 Ω with no snubber: the run aborts (see the deck header).
    const station = makeStation({
      capacitance_F: 2.2e-3,
      voltage_V: 1600,
      esl_H: 0.2e-6,
      switch: { kind: 'thyristor', thresholdVoltage_V: 1.2, slopeResistance_Ohm: 0.4e-3 },
      freewheel: { position: 'fixture', thresholdVoltage_V: 0.9, slopeResistance_Ohm: 0.3e-3 },
      cableResistance_Ohm: 3e-3,
      cableInductance_H: 1.5e-6,
      coilInductance_H: 180e-6,
      coilResistance_Ohm: 25e-3,
    });
    expect(() => runNgspice(stationDeck(station, { tStop_s: 3e-3, maxStep_s: 2e-6, snubber_F: 0 }))).toThrow(NgspiceError);
  });
});

describe.skipIf(!ng.path)('ngspice vs closed-form series RLC (Nilsson & Riedel, natural response)', () => {
  // Series loop spread over the station's parts; no thresholds, no freewheel diode: exactly a series RLC
  // whose thyristor stops the current at its first zero.
  const cases = [
    { name: 'underdamped', C: 2.2e-3, V0: 1600, esr: 4e-3, rT: 0.4e-3, Rw: 3e-3, Rc: 25e-3, esl: 0.2e-6, Lw: 1.5e-6, Lc: 180e-6 },
    { name: 'overdamped', C: 2.2e-3, V0: 1600, esr: 4e-3, rT: 0.4e-3, Rw: 3e-3, Rc: 1.2, esl: 0.2e-6, Lw: 1.5e-6, Lc: 180e-6 },
    { name: 'lightly damped, small bank', C: 100e-6, V0: 3000, esr: 10e-3, rT: 1e-3, Rw: 5e-3, Rc: 10e-3, esl: 0.1e-6, Lw: 0.5e-6, Lc: 20e-6 },
  ];
  for (const c of cases) {
    test(`${c.name}: peak current, its time and the waveform agree with the closed form`, () => {
      const station = makeStation({
        capacitance_F: c.C,
        voltage_V: c.V0,
        esr_Ohm: c.esr,
        esl_H: c.esl,
        switch: { kind: 'thyristor', thresholdVoltage_V: 0, slopeResistance_Ohm: c.rT },
        cableResistance_Ohm: c.Rw,
        cableInductance_H: c.Lw,
        coilInductance_H: c.Lc,
        coilResistance_Ohm: c.Rc,
      });
      const { R_Ohm, L_H } = seriesTotals(station);
      const cf = seriesRlc(c.C, c.V0, R_Ohm, L_H);
      const pulse_s = cf.regime === 'underdamped' ? cf.currentZero_s : 8 * cf.timeOfPeak_s;
      const tStop = 1.3 * pulse_s;
      const run = runNgspice(stationDeck(station, { tStop_s: tStop, maxStep_s: pulse_s / 2000 }));
      const tr = stationTraces(run);

      const peak = refinedPeak(tr.coil);
      expect(Math.abs(peak.peak / cf.peakCurrent_A - 1)).toBeLessThan(1e-5);
      expect(Math.abs(peak.time_s / cf.timeOfPeak_s - 1)).toBeLessThan(1e-4);

      // Whole waveform up to the current zero (or the end): largest deviation relative to the peak.
      let worst = 0;
      tr.coil.t_s.forEach((t, j) => {
        if (t > Math.min(pulse_s, tStop)) return;
        worst = Math.max(worst, Math.abs(tr.coil.y[j] - cf.current_A(t)));
      });
      expect(worst / cf.peakCurrent_A).toBeLessThan(1e-5);

      if (cf.regime === 'underdamped') {
        // After the first current zero the thyristor blocks: the current stays zero (leakage |v|/ROFF ≈ 2 µA, and
        // the snubber's ring-down, over within 2 % of the pulse; allow 1e-6 of the peak) and the capacitor keeps
        // −V0·e^(−απ/ωd), shared with the switch snubber Cs in series: v_end = v_zero·C/(C + Cs) (charge conservation).
        const after = tr.switch.y.filter((_, j) => tr.switch.t_s[j] > 1.02 * pulse_s);
        expect(after.length).toBeGreaterThan(10);
        for (const i of after) expect(Math.abs(i)).toBeLessThan(1e-6 * cf.peakCurrent_A);
        const vEnd = tr.vcap.y[tr.vcap.y.length - 1];
        const vExpected = (cf.capacitorVoltageAtZero_V * c.C) / (c.C + SNUBBER_C_F);
        expect(Math.abs(vEnd / vExpected - 1)).toBeLessThan(1e-5);
      }
      // The deck's replacement of a zero slope resistance never applies here (r_T > 0), so the loop is exact.
      expect(c.rT).toBeGreaterThan(MIN_RON_OHM);
    });
  }

  test('freewheel at the fixture: after the switch stops, the coil current decays as (I1 + V_F0/R)·e^(−tR/L) − V_F0/R (first-order RL response)', () => {
    const station = makeStation({
      capacitance_F: 2.2e-3,
      voltage_V: 1600,
      esr_Ohm: 4e-3,
      esl_H: 0.2e-6,
      switch: { kind: 'thyristor', thresholdVoltage_V: 1.2, slopeResistance_Ohm: 0.4e-3 },
      freewheel: { position: 'fixture', thresholdVoltage_V: 0.9, slopeResistance_Ohm: 0.3e-3 },
      cableResistance_Ohm: 3e-3,
      cableInductance_H: 1.5e-6,
      coilInductance_H: 180e-6,
      coilResistance_Ohm: 25e-3,
    });
    const tStop = 12e-3;
    const run = runNgspice(stationDeck(station, { tStop_s: tStop, maxStep_s: 2e-6 }));
    const tr = stationTraces(run);
    // The switch stops at its first current zero after the peak; take the freewheel mesh from a little later.
    const jPeak = refinedPeak(tr.coil).index;
    const jOff = tr.switch.y.findIndex((i, j) => j > jPeak && i <= 1e-3);
    expect(jOff).toBeGreaterThan(0);
    const t1 = tr.switch.t_s[jOff] + 50e-6;
    const I1 = sampleAt(tr.coil, t1);
    const R = station.coil.resistance20_Ohm + station.freewheel!.slopeResistance_Ohm;
    const L = station.coil.inductance_H;
    const VF0 = station.freewheel!.thresholdVoltage_V;
    let worst = 0;
    for (let j = 0; j < tr.coil.t_s.length; j++) {
      const t = tr.coil.t_s[j];
      if (t < t1) continue;
      worst = Math.max(worst, Math.abs(tr.coil.y[j] - freewheelCurrent_A(I1, t1, R, L, VF0, t)));
    }
    // 1e-5 of I1: same reasoning as above (ten times RELTOL).
    expect(worst / I1).toBeLessThan(1e-5);
    // The diode carries the whole coil current in this phase (switch current zero).
    expect(Math.abs(sampleAt(tr.diode, t1) / I1 - 1)).toBeLessThan(1e-5);
  });
});

describe.skipIf(!ng.path)('ngspice capacitance sweep in one process (capacitanceSweepDeck) vs closed-form series RLC', () => {
  test('five capacitances from 0.5 to 8 mF: peak current within 1e-5 and its time within 1e-4 of the closed form (Nilsson & Riedel)', () => {
    const station = makeStation({
      capacitance_F: 1e-3,
      voltage_V: 1600,
      esr_Ohm: 4e-3,
      esl_H: 0.2e-6,
      switch: { kind: 'thyristor', thresholdVoltage_V: 0, slopeResistance_Ohm: 0.4e-3 },
      cableResistance_Ohm: 3e-3,
      cableInductance_H: 1.5e-6,
      coilInductance_H: 180e-6,
      coilResistance_Ohm: 25e-3,
    });
    const cs = [0.5e-3, 1e-3, 2.2e-3, 4.7e-3, 8e-3];
    const points = parseSweep(runNgspice(capacitanceSweepDeck(station, cs)).stdout);
    expect(points.map((p) => p.capacitance_F)).toEqual(cs);
    const { R_Ohm, L_H } = seriesTotals(station);
    for (const p of points) {
      const cf = seriesRlc(p.capacitance_F, 1600, R_Ohm, L_H);
      // Same tolerances as the single runs above (same RELTOL and step per pulse).
      expect(Math.abs(p.peakCurrent_A / cf.peakCurrent_A - 1)).toBeLessThan(1e-5);
      expect(Math.abs(p.timeOfPeak_s / cf.timeOfPeak_s - 1)).toBeLessThan(1e-4);
    }
  });
});
