import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { pureWaterDensity, seawaterDensity, t68FromT90, t90FromT68 } from '@shared/chemistry';
import { expectAbsolute } from './expect-close';

// The published EOS-80 check values are at IPTS-68 temperatures; seawaterDensity takes ITS-90, so the
// checks feed t90 = t68 / 1.00024 (Saunders 1990, WOCE Newsletter 10), which the function turns back
// into exactly the tabulated t68.
const EOS80_CHECK_VALUES: ReadonlyArray<{ salinity: number; t68: number; density: number }> = [
  // Fofonoff & Millard 1983, "Algorithms for computation of fundamental properties of seawater",
  // UNESCO Technical Papers in Marine Science 44, check values for ρ(S, t, 0) (Millero & Poisson 1981
  // one-atmosphere EOS-80).
  { salinity: 0, t68: 5, density: 999.96675 },
  { salinity: 0, t68: 25, density: 997.04796 },
  { salinity: 35, t68: 5, density: 1027.67547 },
  { salinity: 35, t68: 25, density: 1023.34306 },
];

describe('seawaterDensity — EOS-80 at one atmosphere', () => {
  it.each(EOS80_CHECK_VALUES)(
    'S = $salinity, t68 = $t68 °C → $density kg/m³ within 0.001',
    ({ salinity, t68, density }) => {
      // Source: UNESCO Technical Paper 44 (Fofonoff & Millard 1983) check values, see table above.
      expectAbsolute(seawaterDensity(salinity, t90FromT68(t68)), density, 0.001);
    },
  );

  it('converts ITS-90 input to IPTS-68 before evaluating', () => {
    // Saunders 1990: t68 = 1.00024 t90. At 25 °C the scales differ by 0.006 K. Seawater's thermal
    // expansion near S = 35, 25 °C is ≈ 3.0e-4 /K (from memory), so ∂ρ/∂t ≈ −0.31 kg/m³/K and the
    // offset is worth ≈ 0.006 × 0.31 = 0.0018 kg/m³ — larger than the 0.001 check tolerance.
    expectAbsolute(t68FromT90(25), 25.006, 1e-9);
    const drop = seawaterDensity(35, t90FromT68(25)) - seawaterDensity(35, 25);
    expect(drop).toBeGreaterThan(0.001);
    expect(drop).toBeLessThan(0.003);
  });

  it('increases with salinity at fixed temperature (property)', () => {
    // Millero & Poisson 1981: ∂ρ/∂S ≈ 0.75–0.82 kg/m³ per unit salinity over the validity range.
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 41, noNaN: true }),
        fc.double({ min: -2, max: 40, noNaN: true }),
        (s, t) => {
          const slope = seawaterDensity(s + 1, t) - seawaterDensity(s, t);
          expect(slope).toBeGreaterThan(0.7);
          expect(slope).toBeLessThan(0.9);
        },
      ),
      { seed: 42, numRuns: 200 },
    );
  });
});

describe('pureWaterDensity — Tanaka et al. 2001', () => {
  it('peaks at a5 = 999.97495 kg/m³ at t = −a1 = 3.983035 °C', () => {
    // Tanaka, Girard, Davis, Peuto & Bignell 2001, Metrologia 38:301, eq. (1): ρ = a5 at t = −a1.
    expectAbsolute(pureWaterDensity(3.983035), 999.97495, 1e-9);
    expect(pureWaterDensity(3)).toBeLessThan(999.97495);
    expect(pureWaterDensity(5)).toBeLessThan(999.97495);
  });

  it('matches tabulated values at 20 °C and 25 °C', () => {
    // Tanaka et al. 2001, Metrologia 38:301, recommended table — from memory: 998.2067 and 997.0470.
    expectAbsolute(pureWaterDensity(20), 998.2067, 0.0001);
    expectAbsolute(pureWaterDensity(25), 997.047, 0.0001);
  });

  it('agrees with the EOS-80 pure-water end member (Bigg 1967 SMOW) to 0.002 kg/m³', () => {
    // Two independent fits to pure-water data (Tanaka et al. 2001 vs the SMOW polynomial inside
    // Millero & Poisson 1981); they are known to differ by a few thousandths over 0–40 °C.
    for (let t = 0; t <= 40; t += 2.5) {
      expectAbsolute(pureWaterDensity(t), seawaterDensity(0, t), 0.002, `${t} °C`);
    }
  });
});
