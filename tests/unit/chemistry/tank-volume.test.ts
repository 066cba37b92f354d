import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { circularSegmentArea, tankVolume } from '@shared/chemistry';
import { expectAbsolute, expectRelative } from './expect-close';

// Geometry worked by hand (1 L = 1000 cm³).

describe('tankVolume', () => {
  it('rectangle', () => {
    // 100 × 40 × 50 cm = 200 000 cm³ = 200 L.
    expect(tankVolume({ shape: 'rectangle', dimensionsCm: { length: 100, width: 40, height: 50 } })).toEqual({
      grossL: 200,
      netL: 200,
    });
  });

  it('rectangle filled to 45 cm with 10 % rock and sand', () => {
    // Water: 100 × 40 × 45 = 180 000 cm³ = 180 L; less 10 % displacement = 162 L. Gross stays 200 L.
    const v = tankVolume({
      shape: 'rectangle',
      dimensionsCm: { length: 100, width: 40, height: 50 },
      fillHeightCm: 45,
      displacementFraction: 0.1,
    });
    expectAbsolute(v.grossL, 200, 1e-9);
    expectAbsolute(v.netL, 162, 1e-9);
  });

  it('cylinder', () => {
    // π × (50/2)² × 100 = π × 62 500 = 196 349.5 cm³ = 196.350 L.
    const v = tankVolume({ shape: 'cylinder', dimensionsCm: { diameter: 50, height: 100 } });
    expectAbsolute(v.grossL, 196.3495, 1e-4);
  });

  it('bowfront with a half-circle bow', () => {
    // bowDepth = length/2 makes the bow a half circle of radius 50: π × 50² / 2 = 3926.99 cm²;
    // footprint 100 × 40 + 3926.99 = 7926.99 cm²; × 50 cm = 396 349.5 cm³ = 396.350 L.
    const v = tankVolume({
      shape: 'bowfront',
      dimensionsCm: { length: 100, width: 40, bowDepth: 50, height: 50 },
    });
    expectAbsolute(v.grossL, 396.3495, 1e-4);
  });

  it('bowfront with a shallow bow', () => {
    // Chord 100, sagitta 10: r = 100²/(8 × 10) + 10/2 = 130 cm; θ = 2 asin(50/130) = 0.789582 rad;
    // segment = r²/2 (θ − sin θ) = 8450 × (0.789582 − 0.710059) = 671.97 cm².
    // Footprint 4000 + 671.97 = 4671.97 cm² × 50 cm = 233.598 L.
    expectAbsolute(circularSegmentArea(100, 10), 671.97, 0.01);
    const v = tankVolume({
      shape: 'bowfront',
      dimensionsCm: { length: 100, width: 40, bowDepth: 10, height: 50 },
    });
    expectAbsolute(v.grossL, 233.598, 1e-3);
    // Archimedes: a shallow segment is close to the parabolic segment (2/3) c h = 666.7 cm² (within 1 %).
    expectRelative(circularSegmentArea(100, 10), (2 / 3) * 100 * 10, 0.01);
  });

  it('a bowfront without a bow is a rectangle', () => {
    const bow = tankVolume({
      shape: 'bowfront',
      dimensionsCm: { length: 90, width: 45, bowDepth: 0, height: 55 },
    });
    const box = tankVolume({ shape: 'rectangle', dimensionsCm: { length: 90, width: 45, height: 55 } });
    expect(bow).toEqual(box);
  });

  it('net never exceeds gross and shrinks with displacement (property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 10, max: 300, noNaN: true }),
        fc.double({ min: 10, max: 100, noNaN: true }),
        fc.double({ min: 10, max: 100, noNaN: true }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.double({ min: 0, max: 0.9, noNaN: true }),
        (length, width, height, fill, displacementFraction) => {
          const v = tankVolume({
            shape: 'bowfront',
            dimensionsCm: { length, width, bowDepth: length / 4, height },
            fillHeightCm: fill * height,
            displacementFraction,
          });
          expect(v.netL).toBeLessThanOrEqual(v.grossL);
          expect(v.netL).toBeCloseTo(v.grossL * fill * (1 - displacementFraction), 9);
        },
      ),
      { seed: 42, numRuns: 200 },
    );
  });
});
