import { z } from 'zod';
import { ANY_PARAMETER_KEYS, PARAMETER_KEYS, parameterInfo, type AnyParameterKey } from '../parameters';
import { SYSTEM_TYPES } from '../system-types';

const provenanceSchema = z.discriminatedUnion('kind', [
  z.object({
    kind: z.literal('published'),
    citation: z.string().min(1),
    short: z.string().optional(),
    fromMemory: z.boolean().optional(),
    note: z.string().optional(),
  }),
  z.object({ kind: z.literal('common-practice'), note: z.string().optional() }),
]);

const bandSchema = z
  .tuple([z.number(), z.number()])
  .refine(([min, max]) => min <= max, { message: 'band min must not exceed max' });

const rangeSchema = z
  .object({
    ideal: bandSchema,
    caution: bandSchema,
    danger: z.object({ above: z.number().optional(), below: z.number().optional() }).optional(),
    unit: z.string(),
    target: z.number().optional(),
    provenance: provenanceSchema,
  })
  .refine((r) => r.caution[0] <= r.ideal[0] && r.ideal[1] <= r.caution[1], {
    message: 'ideal band must sit inside the caution band',
  })
  .refine((r) => r.target === undefined || (r.target >= r.ideal[0] && r.target <= r.ideal[1]), {
    message: 'target must sit inside the ideal band',
  });

const parameterKeySchema = z.enum(PARAMETER_KEYS as [string, ...string[]]);
const anyParameterKeySchema = z.enum(ANY_PARAMETER_KEYS as [string, ...string[]]);
const cadenceSchema = z.partialRecord(parameterKeySchema, z.number().positive().max(365));

/** Validates a profile, e.g. a club's edited copy, before it is stored or used. */
export const careProfileSchema = z
  .object({
    key: z.string().regex(/^[a-z0-9]+(-[a-z0-9]+)*$/, 'key must be kebab-case'),
    name: z.string().min(1),
    version: z.number().int().positive(),
    systemTypes: z.array(z.enum(SYSTEM_TYPES)).min(1),
    animals: z.string().min(1),
    ranges: z.partialRecord(anyParameterKeySchema, rangeSchema),
    cadences: z.object({ cycling: cadenceSchema, established: cadenceSchema, provenance: provenanceSchema }),
    readinessNotes: z
      .object({
        food: z.string().optional(),
        quarantine: z.string().optional(),
        equipment: z.string().optional(),
      })
      .optional(),
  })
  .superRefine((profile, ctx) => {
    for (const [key, r] of Object.entries(profile.ranges)) {
      if (!r) continue;
      const expected = parameterInfo(key as AnyParameterKey).unit;
      if (r.unit !== expected) {
        ctx.addIssue({
          code: 'custom',
          path: ['ranges', key, 'unit'],
          message: `unit must be the canonical "${expected}"`,
        });
      }
    }
  });

export type CareProfileInput = z.input<typeof careProfileSchema>;
