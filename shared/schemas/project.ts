import { z } from 'zod';
import { projectRoleSchema } from '../auth/permissions';
import { monthClimateSchema } from '../calc/moisture/schema';
import { windSiteSchema } from '../calc/wind/schema';
import type { Unbranded } from '../units/brands';
import { int4, TEXT_MAX, text, versionedFields } from './common';

/** ASHRAE 169 climate zone designations: 0–8 with moisture regime A (moist), B (dry), C (marine) where used. */
export const CLIMATE_ZONES = [
  '0A',
  '0B',
  '1A',
  '1B',
  '2A',
  '2B',
  '3A',
  '3B',
  '3C',
  '4A',
  '4B',
  '4C',
  '5A',
  '5B',
  '5C',
  '6A',
  '6B',
  '7',
  '8',
] as const;
export const climateZoneSchema = z.enum(CLIMATE_ZONES);

/** Site fields of a project, all SI. Ranges are sanity limits for buildings on Earth, not code limits. */
export const projectSiteSchema = z.object({
  siteAddress: text(TEXT_MAX.line).default('').describe('Free-text site address.'),
  climateZone: climateZoneSchema.describe('ASHRAE 169 climate zone designation.'),
  elevationM: z
    .number()
    .min(-500)
    .max(6000)
    .default(0)
    .describe('Ground elevation above sea level, m (−500…6000).'),
  buildingHeightM: z
    .number()
    .min(1, 'at least 1 m — a lower building is a typing or unit slip')
    .max(600)
    .describe('Mean roof height h, m (1…600).'),
  planLengthM: z
    .number()
    .min(1, 'at least 1 m — a shorter side is a typing or unit slip')
    .max(2000)
    .describe('Plan length (longer side), m (1…2000).'),
  planWidthM: z
    .number()
    .min(1, 'at least 1 m — a shorter side is a typing or unit slip')
    .max(2000)
    .describe('Plan width (shorter side), m (1…2000).'),
  indoorTempC: z.number().min(-40).max(60).describe('Indoor design temperature, °C (−40…60).'),
  indoorRh: z.number().min(0).max(1).describe('Indoor design relative humidity, fraction 0–1.'),
  winterDesignTempC: z
    .number()
    .min(-60)
    .max(40)
    .describe('Winter (heating) design temperature, °C (−60…40).'),
  summerDesignTempC: z
    .number()
    .min(-20)
    .max(60)
    .describe('Summer (cooling) design temperature, °C (−20…60).'),
});

export const projectInputSchema = projectSiteSchema
  .extend({
    name: text(TEXT_MAX.name).min(1, 'a project needs a name'),
    number: text(50).default(''),
    description: text(TEXT_MAX.note).default(''),
  })
  .refine((p) => p.planWidthM <= p.planLengthM, {
    path: ['planWidthM'],
    message: 'plan width must not exceed plan length',
  })
  .refine((p) => p.summerDesignTempC > p.winterDesignTempC, {
    path: ['summerDesignTempC'],
    message: 'summer design temperature must be above the winter design temperature',
  });
export type ProjectInput = Unbranded<z.infer<typeof projectInputSchema>>;

/**
 * A save of one part of a project (site data, wind data, climate) names the project version it was based on;
 * it conflicts only with a later save of the same part (optimistic concurrency per part).
 */
const baseVersion = int4().describe(
  'The project version this save is based on; 409 if the same part was saved after it',
);
export const projectUpdateSchema = z.object({
  version: baseVersion,
  changes: projectInputSchema,
});
export type ProjectUpdate = Unbranded<z.infer<typeof projectUpdateSchema>>;

/**
 * The project's wind data (ASCE 7 site parameters). Height, plan dimensions and the ground elevation come from
 * the site fields, so they are not repeated here: one site elevation serves K_e, the sheet and every screen.
 */
export const projectWindSchema = windSiteSchema.pick({
  edition: true,
  basicWindSpeed: true,
  riskCategory: true,
  exposure: true,
  Kzt: true,
  keEqualsOne: true,
  enclosure: true,
  roofSlopeDeg: true,
});
/** What `projectWindSchema` parses: heights and elevation `Metre` (D-028). */
export type ProjectWindSI = z.infer<typeof projectWindSchema>;
export type ProjectWind = Unbranded<ProjectWindSI>;

/** Twelve monthly mean exterior climates (January first) with where they come from, for the moisture check. */
export const projectClimateSchema = z.object({
  months: z.array(monthClimateSchema).length(12, 'enter all 12 months, January first'),
  source: text(TEXT_MAX.line).min(1, 'name where the monthly values come from'),
  humidityClass: z
    .number()
    .int()
    .min(1)
    .max(5)
    .optional()
    .describe('ISO 13788 Annex A humidity class 1–5; omitted = the fixed indoor design temperature and RH'),
});
/** What `projectClimateSchema` parses: monthly temperatures `Celsius` (D-028). */
export type ProjectClimateSI = z.infer<typeof projectClimateSchema>;
export type ProjectClimate = Unbranded<ProjectClimateSI>;

export const projectWindUpdateSchema = z.object({
  version: baseVersion,
  wind: projectWindSchema,
});
export const projectClimateUpdateSchema = z.object({
  version: baseVersion,
  climate: projectClimateSchema,
});

/** A project's building and indoor/outdoor design data as answered (and as a stored check run keeps it). */
export const projectDesignData = {
  buildingHeightM: z.number(),
  planLengthM: z.number(),
  planWidthM: z.number(),
  indoorTempC: z.number(),
  indoorRh: z.number(),
  winterDesignTempC: z.number(),
  summerDesignTempC: z.number(),
};

export const projectSchema = z.object({
  id: z.uuid(),
  organisationId: z.uuid(),
  organisationName: z.string(),
  name: z.string(),
  number: z.string(),
  description: z.string(),
  siteAddress: z.string(),
  climateZone: climateZoneSchema,
  elevationM: z.number(),
  ...projectDesignData,
  wind: projectWindSchema.nullable(),
  climate: projectClimateSchema.nullable(),
  archivedAt: z.string().nullable(),
  ...versionedFields,
  myRole: projectRoleSchema,
});
export type Project = Unbranded<z.infer<typeof projectSchema>>;

/** A copy of a project (site data, wind, climate, assemblies), named "<name> (copy)" unless given. */
export const projectDuplicateSchema = z.object({
  name: text(TEXT_MAX.name).min(1, 'a project needs a name').optional(),
  number: text(50).optional(),
});

export const projectListQuerySchema = z.object({ archived: z.enum(['true', 'false']).optional() });
