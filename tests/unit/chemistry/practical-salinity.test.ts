import { describe, it, expect } from 'vitest';
import {
  C3515_MS_PER_CM,
  practicalSalinity,
  practicalSalinityFromConductivity,
  t90FromT68,
} from '@shared/chemistry';
import { expectAbsolute } from './expect-close';

// Check values of PSS-78 with its pressure term: Fofonoff & Millard 1983, "Algorithms for computation
// of fundamental properties of seawater", UNESCO Technical Papers in Marine Science 44, p. 9. They are
// at IPTS-68 temperatures, so the inputs below are t90 = t68 / 1.00024 (Saunders 1990).
const PSS78_CHECK_VALUES: ReadonlyArray<{ r: number; t68: number; p: number; salinity: number }> = [
  { r: 1, t68: 15, p: 0, salinity: 35 },
  { r: 1.2, t68: 20, p: 2000, salinity: 37.245628 },
  { r: 0.65, t68: 5, p: 1500, salinity: 27.995347 },
];

describe('practicalSalinity — PSS-78', () => {
  it.each(PSS78_CHECK_VALUES)(
    'R = $r, t68 = $t68 °C, p = $p dbar → S = $salinity within 0.0001',
    ({ r, t68, p, salinity }) => {
      // Source: UNESCO Technical Paper 44 (Fofonoff & Millard 1983), p. 9, see table above.
      expectAbsolute(
        practicalSalinity({ conductivityRatio: r, tempC: t90FromT68(t68), pressureDbar: p }),
        salinity,
        0.0001,
      );
    },
  );

  it('defaults the pressure to 0 dbar', () => {
    // Same UNESCO TP 44 check value, R = 1 at 15 °C (t68), 0 dbar → 35.
    expectAbsolute(practicalSalinity({ conductivityRatio: 1, tempC: t90FromT68(15) }), 35, 0.0001);
  });

  it('throws outside the scale validity 2–42', () => {
    // Lewis & Perkin 1981 / UNESCO TP 37: PSS-78 is defined for 2 ≤ S ≤ 42.
    expect(() => practicalSalinity({ conductivityRatio: 0.02, tempC: 20 })).toThrow(
      /outside the PSS-78 validity of 2–42/,
    );
    expect(() => practicalSalinity({ conductivityRatio: 1.6, tempC: 15 })).toThrow(RangeError);
  });
});

describe('practicalSalinityFromConductivity', () => {
  it('gives S = 35 for 42.914 mS/cm at 15 °C (t68)', () => {
    // PSS-78 defines S = 35 by K15 = 1; C(35, 15, 0) = 42.914 mS/cm (Culkin & Smith 1980, IEEE J.
    // Oceanic Eng. OE-5:22, as used by Fofonoff & Millard 1983) — from memory.
    expect(C3515_MS_PER_CM).toBe(42.914);
    expectAbsolute(practicalSalinityFromConductivity({ mScm: 42.914, tempC: t90FromT68(15) }), 35, 0.0001);
  });

  it('matches the pressure-free check value scaled to mS/cm', () => {
    // UNESCO TP 44 check R = 0.65 only exists with pressure; at 0 dbar use the intermediate value
    // Rt(5 °C) = 0.81705885 ↔ S = 27.995347 given with that check: R = Rt · rt(5) where
    // rt(5) = 0.6766097 + 0.100282 + 0.0027606 − 0.0000871 + 0.0000006 = 0.7795658 (Fofonoff & Millard
    // eq. 3), so R = 0.81705885 × 0.7795658 = 0.6369512 and C = 0.6369512 × 42.914 = 27.33412 mS/cm.
    // S depends on Rt and t only, so the 1500 dbar check's S carries over to 0 dbar.
    expectAbsolute(
      practicalSalinityFromConductivity({ mScm: 27.33412, tempC: t90FromT68(5) }),
      27.995347,
      0.0001,
    );
  });
});
