import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { cubicIntegral, cubicInverse, cubicSlope, cubicValue, monotoneCubic } from './magnetic-circuit-spline.js';

describe('monotoneCubic', () => {
  it('reproduces a monotone cubic exactly when given its exact slopes (cubic Hermite interpolation is exact for cubics: closed form)', () => {
    const f = (x: number) => x ** 3 + x;
    const df = (x: number) => 3 * x * x + 1;
    const xs = [0, 0.3, 0.7, 1.2, 2];
    const c = monotoneCubic(xs, xs.map(f), { slopes: xs.map(df) });
    for (let v = 0; v <= 2; v += 0.013) {
      // Tolerance: rounding only (values of order 10).
      expect(cubicValue(c, v)).toBeCloseTo(f(v), 12);
      expect(cubicSlope(c, v)).toBeCloseTo(df(v), 11);
      // ∫0^v (x³ + x) dx = v⁴/4 + v²/2 (closed form)
      expect(cubicIntegral(c, v)).toBeCloseTo(v ** 4 / 4 + v ** 2 / 2, 12);
    }
  });

  it('continues as a straight line with the end slopes outside the knots', () => {
    const c = monotoneCubic([0, 1, 2], [0, 1, 1.5], { endSlope: 0.25 });
    expect(cubicValue(c, 4)).toBeCloseTo(1.5 + 0.25 * 2, 14);
    expect(cubicSlope(c, 10)).toBe(0.25);
    // ∫ beyond the end: table integral + straight-line piece (closed form of a trapezoid)
    expect(cubicIntegral(c, 4) - cubicIntegral(c, 2)).toBeCloseTo(1.5 * 2 + 0.25 * 2, 14);
  });

  it('stays monotone and between neighbouring data on the Fritsch–Carlson test data (RPN 14 set, values from memory)', () => {
    // The data set used by Fritsch & Carlson (1980) to show overshoot of ordinary splines; from memory.
    const xs = [7.99, 8.09, 8.19, 8.7, 9.2, 10, 12, 15, 20];
    const ys = [0, 2.76429e-5, 4.37498e-2, 0.169183, 0.469428, 0.94374, 0.998636, 0.999919, 0.999994];
    const c = monotoneCubic(xs, ys);
    let prev = -Infinity;
    for (let k = 0; k < xs.length - 1; k++) {
      for (let j = 0; j <= 200; j++) {
        const v = xs[k] + ((xs[k + 1] - xs[k]) * j) / 200;
        const p = cubicValue(c, v);
        expect(p).toBeGreaterThanOrEqual(prev - 1e-15);
        expect(p).toBeGreaterThanOrEqual(ys[k] - 1e-15);
        expect(p).toBeLessThanOrEqual(ys[k + 1] + 1e-15);
        prev = p;
      }
    }
  });

  it('is monotone for any non-decreasing data (property, fast-check)', () => {
    fc.assert(
      fc.property(
        fc.array(fc.tuple(fc.double({ min: 1e-3, max: 10, noNaN: true }), fc.double({ min: 0, max: 10, noNaN: true })), { minLength: 2, maxLength: 12 }),
        (steps) => {
          const xs = [0];
          const ys = [0];
          for (const [dx, dy] of steps) {
            xs.push(xs[xs.length - 1] + dx);
            ys.push(ys[ys.length - 1] + dy);
          }
          const c = monotoneCubic(xs, ys);
          let prev = -Infinity;
          const span = xs[xs.length - 1];
          for (let j = 0; j <= 400; j++) {
            const p = cubicValue(c, (span * j) / 400);
            if (p < prev - 1e-9 * (1 + Math.abs(prev))) return false;
            prev = p;
          }
          return true;
        },
      ),
      { numRuns: 200 },
    );
  });

  it('slope is the derivative of the value and the integral’s derivative is the value (central differences, O(h²) ≈ 1e-8)', () => {
    const c = monotoneCubic([0, 0.5, 1, 3, 10], [0, 0.8, 1.2, 1.6, 1.9]);
    for (const v of [0.1, 0.49, 0.77, 2.2, 7.5]) {
      const h = 1e-5;
      expect(cubicSlope(c, v)).toBeCloseTo((cubicValue(c, v + h) - cubicValue(c, v - h)) / (2 * h), 6);
      expect(cubicValue(c, v)).toBeCloseTo((cubicIntegral(c, v + h) - cubicIntegral(c, v - h)) / (2 * h), 6);
    }
  });

  it('cubicInverse undoes cubicValue inside and outside the knots', () => {
    const c = monotoneCubic([0, 0.5, 1, 3, 10], [0, 0.8, 1.2, 1.6, 1.9], { endSlope: 0.01 });
    for (const v of [0, 0.1, 0.49, 0.77, 2.2, 7.5, 10, 25]) {
      expect(cubicInverse(c, cubicValue(c, v))).toBeCloseTo(v, 10);
    }
  });

  it('rejects knots that do not increase and values that decrease', () => {
    expect(() => monotoneCubic([0, 0], [0, 1])).toThrow(RangeError);
    expect(() => monotoneCubic([0, 1], [1, 0])).toThrow(RangeError);
  });
});
