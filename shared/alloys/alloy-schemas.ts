import { z } from 'zod';
import { ALLOY_FAMILIES, ALLOY_TRAITS, alloySchema, findAlloy, rangeSchema } from '../domain/index.ts';

// The alloy library as a workshop sees it: the trade core's alloys plus the
// workshop's own ("wheel scrap, assumed A356"). Temperatures are °C, density
// g/cm³, shrinkage %, as everywhere in the API; the client converts.

export const ALLOY_ORIGINS = ['library', 'workshop'] as const;
export type AlloyOrigin = (typeof ALLOY_ORIGINS)[number];

export const workshopAlloyParamsSchema = z.object({
  workshopId: z.uuid('Unknown workshop'),
  alloyId: z.uuid('Unknown alloy'),
});

const temperatureC = z
  .number({ error: 'Enter a temperature in °C' })
  .min(100, 'At least 100 °C')
  .max(1700, 'At most 1700 °C');
const rangeC = rangeSchema.refine((r) => r.min >= 100 && r.max <= 1700, { message: 'Between 100 and 1700 °C' });
const percentRange = rangeSchema.refine((r) => r.min >= 0 && r.max <= 20, { message: 'Between 0 and 20 %' });

/** A library alloy to start from: the base's values and citations are copied. */
const basedOnSchema = z
  .string()
  .trim()
  .min(1)
  .max(60)
  .transform((d, ctx) => {
    const base = findAlloy(d);
    if (!base) {
      ctx.addIssue({ code: 'custom', message: `"${d}" is not an alloy in the library` });
      return z.NEVER;
    }
    return base.designation;
  });

/**
 * The values a workshop may give its own alloy. `null` clears an optional
 * value on an update; leaving a key out keeps what is there (or the base's).
 */
const fields = {
  designation: z.string().trim().min(1, 'Give it a designation').max(60, 'At most 60 characters'),
  commonName: z.string().trim().min(1).max(160, 'At most 160 characters'),
  family: z.enum(ALLOY_FAMILIES, { error: `One of ${ALLOY_FAMILIES.join(', ')}` }),
  solidusC: temperatureC,
  liquidusC: temperatureC,
  pourRangeC: z
    .object({ sand: rangeC.nullable().optional(), permanentMould: rangeC.nullable().optional() })
    .strict(),
  densityGcm3: z.number({ error: 'Enter a density in g/cm³' }).positive('Above 0 g/cm³').max(25, 'At most 25 g/cm³'),
  volumetricShrinkagePct: percentRange.nullable(),
  patternShrinkPct: z.number({ error: 'Enter a percentage' }).min(0, 'At least 0 %').max(5, 'At most 5 %').nullable(),
  traits: z.array(z.enum(ALLOY_TRAITS)).max(ALLOY_TRAITS.length),
  /** Where the workshop's values come from; shown beside them in the library. */
  source: z.string().trim().min(3, 'Say where these values come from').max(400, 'At most 400 characters'),
};

/** Values a new alloy needs unless it is based on a library alloy. */
const NEEDED_WITHOUT_BASE = ['family', 'solidusC', 'liquidusC', 'densityGcm3'] as const;

export const workshopAlloyCreateSchema = z
  .object({
    designation: fields.designation,
    basedOn: basedOnSchema.optional(),
    commonName: fields.commonName.optional(),
    family: fields.family.optional(),
    solidusC: fields.solidusC.optional(),
    liquidusC: fields.liquidusC.optional(),
    pourRangeC: fields.pourRangeC.optional(),
    densityGcm3: fields.densityGcm3.optional(),
    volumetricShrinkagePct: fields.volumetricShrinkagePct.optional(),
    patternShrinkPct: fields.patternShrinkPct.optional(),
    traits: fields.traits.optional(),
    source: fields.source,
  })
  .strict()
  .superRefine((input, ctx) => {
    if (input.basedOn !== undefined) return;
    for (const key of NEEDED_WITHOUT_BASE) {
      if (input[key] === undefined) {
        ctx.addIssue({ code: 'custom', path: [key], message: 'Needed unless the alloy is based on a library alloy' });
      }
    }
  });
export type WorkshopAlloyCreateInput = z.output<typeof workshopAlloyCreateSchema>;

export const workshopAlloyUpdateSchema = z
  .object({
    designation: fields.designation.optional(),
    commonName: fields.commonName.optional(),
    family: fields.family.optional(),
    solidusC: fields.solidusC.optional(),
    liquidusC: fields.liquidusC.optional(),
    pourRangeC: fields.pourRangeC.optional(),
    densityGcm3: fields.densityGcm3.optional(),
    volumetricShrinkagePct: fields.volumetricShrinkagePct.optional(),
    patternShrinkPct: fields.patternShrinkPct.optional(),
    traits: fields.traits.optional(),
    source: fields.source.optional(),
  })
  .strict()
  .refine((v) => Object.values(v).some((x) => x !== undefined), { message: 'Nothing to change' });
export type WorkshopAlloyUpdateInput = z.output<typeof workshopAlloyUpdateSchema>;

/**
 * One row of the alloy library (GET /workshops/:workshopId/alloys): a library
 * alloy (`id` null) or one of the workshop's own, with who added it.
 */
export const alloyEntrySchema = z.object({
  origin: z.enum(ALLOY_ORIGINS),
  id: z.uuid().nullable(),
  alloy: alloySchema,
  createdBy: z.uuid().nullable(),
  createdByName: z.string().nullable(),
  createdAt: z.string().nullable(),
  updatedAt: z.string().nullable(),
});
export type AlloyEntry = z.infer<typeof alloyEntrySchema>;
