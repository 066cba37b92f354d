import { requireInRange, requireObject, requireOneOf, requirePositive } from './validate';

export const TANK_SHAPES = ['rectangle', 'cylinder', 'bowfront'] as const;
export type TankShape = (typeof TANK_SHAPES)[number];

/** All dimensions are inside measurements in centimetres (glass thickness already excluded). */
export interface RectangleDimensions {
  length: number;
  width: number;
  height: number;
}
export interface CylinderDimensions {
  diameter: number;
  height: number;
}
/**
 * A rectangle of length × width (the depth at the side panels) plus a front bow that bulges
 * `bowDepth` further out at the centre. The bow is modelled as a circular segment whose chord is the
 * full length and whose height (sagitta) is bowDepth; bowDepth ≤ length / 2 (a half circle).
 */
export interface BowfrontDimensions {
  length: number;
  width: number;
  bowDepth: number;
  height: number;
}

interface CommonOptions {
  /** Water height, cm; defaults to the full height. */
  fillHeightCm?: number;
  /** Fraction of the water volume taken by rock, sand and equipment, 0–0.9. */
  displacementFraction?: number;
}

export type TankVolumeInput =
  | ({ shape: 'rectangle'; dimensionsCm: RectangleDimensions } & CommonOptions)
  | ({ shape: 'cylinder'; dimensionsCm: CylinderDimensions } & CommonOptions)
  | ({ shape: 'bowfront'; dimensionsCm: BowfrontDimensions } & CommonOptions);

export interface TankVolume {
  /** Internal volume of the tank filled to the brim, litres. */
  grossL: number;
  /** Water actually held: filled to fillHeightCm, less the displaced fraction, litres. */
  netL: number;
}

export const MAX_DISPLACEMENT_FRACTION = 0.9;

/** Area of a circular segment with chord c and sagitta h (0 ≤ h ≤ c/2). */
export function circularSegmentArea(chord: number, sagitta: number): number {
  const c = requirePositive('chord', chord, 'cm');
  const h = requireInRange('sagitta', sagitta, 0, c / 2, 'cm', 'at most half the chord');
  if (h === 0) return 0;
  const radius = (c * c) / (8 * h) + h / 2;
  const angle = 2 * Math.asin(Math.min(1, c / (2 * radius)));
  return ((radius * radius) / 2) * (angle - Math.sin(angle));
}

function footprintAndHeight(
  shape: TankShape,
  dims: Record<string, unknown>,
): { areaCm2: number; heightCm: number } {
  switch (shape) {
    case 'rectangle': {
      const length = requirePositive('dimensionsCm.length', dims.length, 'cm');
      const width = requirePositive('dimensionsCm.width', dims.width, 'cm');
      return { areaCm2: length * width, heightCm: requirePositive('dimensionsCm.height', dims.height, 'cm') };
    }
    case 'cylinder': {
      const diameter = requirePositive('dimensionsCm.diameter', dims.diameter, 'cm');
      return {
        areaCm2: (Math.PI * diameter * diameter) / 4,
        heightCm: requirePositive('dimensionsCm.height', dims.height, 'cm'),
      };
    }
    case 'bowfront': {
      const length = requirePositive('dimensionsCm.length', dims.length, 'cm');
      const width = requirePositive('dimensionsCm.width', dims.width, 'cm');
      const bowDepth = requireInRange(
        'dimensionsCm.bowDepth',
        dims.bowDepth,
        0,
        length / 2,
        'cm',
        'at most half the length',
      );
      return {
        areaCm2: length * width + circularSegmentArea(length, bowDepth),
        heightCm: requirePositive('dimensionsCm.height', dims.height, 'cm'),
      };
    }
  }
}

export function tankVolume(input: TankVolumeInput): TankVolume {
  const obj = requireObject('input', input);
  const shape = requireOneOf('shape', obj.shape, TANK_SHAPES);
  const dims = requireObject('dimensionsCm', obj.dimensionsCm);
  const { areaCm2, heightCm } = footprintAndHeight(shape, dims);
  const fill = requireInRange(
    'fillHeightCm',
    obj.fillHeightCm ?? heightCm,
    0,
    heightCm,
    'cm',
    'at most the tank height',
  );
  const displaced = requireInRange(
    'displacementFraction',
    obj.displacementFraction ?? 0,
    0,
    MAX_DISPLACEMENT_FRACTION,
  );
  const CM3_PER_L = 1000;
  return {
    grossL: (areaCm2 * heightCm) / CM3_PER_L,
    netL: ((areaCm2 * fill) / CM3_PER_L) * (1 - displaced),
  };
}
