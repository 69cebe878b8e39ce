import { describe, expect, it } from 'vitest';
import { fileURLToPath } from 'node:url';
import { InputError } from '../errors.js';
import { coilSpecJson, loadCoilSpec, parseCoilSpec } from './coil-spec.js';

const ROOT = fileURLToPath(new URL('../../../../../', import.meta.url));

describe('parseCoilSpec(text, fileName)', () => {
  const SPEC = `windings:
  - { innerRadius: 20 mm, layers: 4, length: 20 mm, conductor: { shape: round, awg: 16 } }
`;
  it('reads a geometry-only spec: figures, estimates and a probe at the coil centre; no bodies, no step response', () => {
    const r = parseCoilSpec(SPEC, 'g.yaml');
    expect(r.name).toBe('g');
    expect(r.build.info.turns).toBe(4 * Math.floor(20 / 1.2908));
    expect(r.stepResponse).toBeNull();
    expect(r.build.probes[0].name).toBe('part');
  });

  it('with a conductive part (its grade’s resistivity) the step response at its centre comes out, t50 < t90, and of the order of µ0σa² (Carslaw & Jaeger: t90 ≈ 0.6·τ for a long cylinder)', () => {
    const r = parseCoilSpec(`${SPEC}part: { outerRadius: 12 mm, length: 40 mm, radialShells: 8 }\ngrade: smco5\n`, 'g.yaml');
    const tau = (4e-7 * Math.PI * 0.012 ** 2) / 0.55e-6;
    expect(r.stepResponse!.t50_s).toBeLessThan(r.stepResponse!.t90_s);
    expect(r.stepResponse!.t90_s / tau).toBeGreaterThan(0.3);
    expect(r.stepResponse!.t90_s / tau).toBeLessThan(0.9);
  });

  it('bad input names the field (with its line) and the file', () => {
    let e: unknown;
    try {
      parseCoilSpec(`windings:\n  - { innerRadius: 20 mm, layers: 4, lenght: 20 mm, conductor: { shape: round, awg: 16 } }\n`, 'bad.yaml');
    } catch (err) {
      e = err;
    }
    expect(e).toBeInstanceOf(InputError);
    const issue = (e as InputError).issues.find((i) => i.code === 'design.unknown-field')!;
    expect(issue.path).toBe('windings[0].lenght');
    expect(issue.suggestion).toBe('length');
    expect((e as InputError).file).toBe('bad.yaml');
  });

  it('reads the example spec, and a whole design file with a fixture section gives the same coil', () => {
    const r = loadCoilSpec(`${ROOT}examples/coils/g7.yaml`);
    expect(r.name).toBe('Orbell Servo G-7 coil');
    const d = loadCoilSpec(`${ROOT}examples/geometry-station.yaml`);
    expect(d.name).toBe('Orbell Servo, line 2, rotor fixture G-7');
    expect(d.build.coil.inductance_H).toBe(r.build.coil.inductance_H);
    expect(d.build.coupled.length).toBe(r.build.coupled.length);
    const j = coilSpecJson(r) as { coil: { turns: number }; bodies: unknown[]; loops: unknown[] };
    expect(j.coil.turns).toBe(r.build.info.turns);
    expect(j.bodies).toHaveLength(2);
    expect(j.loops.length).toBe(r.build.coupled.length);
    expect(JSON.parse(JSON.stringify(j))).toEqual(j);
  });
});
