import { z } from 'zod';
import { idSchema, timestampSchema } from './id.schema';
import { listQuerySchema, queryBooleanSchema } from './list-query.schema';
import { flangeClassSchema } from './spool-design-primitives.schema';
import { textSchema } from './text.schema';
import { GASKET_TYPES } from '../standards/flange-joint-kits';

export { flangeClassSchema };

/** Units a job's dimensions are shown in: millimetres, or feet-inches to 1/16". */
export const jobUnitsSchema = z.enum(['mm', 'ft-in']);
/** Job display units. */
export type JobUnits = z.infer<typeof jobUnitsSchema>;

/** Where a job stands. `archived` is set only through the archive endpoint. */
export const jobStatusSchema = z.enum(['active', 'on-hold', 'complete', 'archived']);
/** Job status. */
export type JobStatus = z.infer<typeof jobStatusSchema>;

/**
 * A job's default spec, applied to new spools: pipe material, wall schedule,
 * flange class, and the shop allowances used in cut lengths (all in millimetres).
 * The flange class is one Tackline has ASME B16.5 tables for (150, 300, 600); any other
 * is refused with that list, never printed as another class.
 */
export const jobSpecSchema = z
  .object({
    material: textSchema().trim().min(1).max(120),
    schedule: textSchema().trim().min(1).max(20),
    flangeClass: flangeClassSchema,
    rootGapMm: z.number().min(0).max(10),
    sawKerfMm: z.number().min(0).max(10),
    minPieceLengthMm: z.number().min(0).max(2000),

    // ── Loose items kitted with every flange face (optional; Tackline's defaults otherwise) ──
    /** ASME B16.20 spiral-wound or ASME B16.21 sheet gaskets. */
    gasketType: z.enum(GASKET_TYPES).optional(),
    /** Stud and nut material as ordered. */
    boltingMaterial: textSchema().trim().min(1).max(80).optional(),
    // ── end of loose-item fields ──
  })
  .strict();
/** A job's default spec. */
export type JobSpec = z.infer<typeof jobSpecSchema>;

/** Job number: the shop's own reference, unique within the shop. */
export const jobNumberSchema = z
  .string()
  .trim()
  .min(1)
  .max(40)
  .regex(/^[A-Za-z0-9][A-Za-z0-9._/-]*$/, 'Letters, digits, and . _ / - only');

/** A job as the API returns it. */
export const jobSchema = z.object({
  id: idSchema,
  number: z.string(),
  title: z.string(),
  client: z.string(),
  site: z.string(),
  units: jobUnitsSchema,
  spec: jobSpecSchema,
  status: jobStatusSchema,
  spoolCount: z.number().int().min(0),
  archivedAt: timestampSchema.nullable(),
  createdAt: timestampSchema,
  updatedAt: timestampSchema,
  version: z.number().int(),
});
/** A job as the API returns it. */
export type Job = z.infer<typeof jobSchema>;

const textField = (max: number) => textSchema().trim().min(1).max(max);

/** `POST /api/jobs` body. */
export const jobCreateSchema = z
  .object({
    number: jobNumberSchema,
    title: textField(200),
    client: textField(200),
    site: textSchema().trim().max(200).default(''),
    units: jobUnitsSchema.default('mm'),
    spec: jobSpecSchema,
    status: jobStatusSchema.exclude(['archived']).default('active'),
  })
  .strict();
/** Parsed `POST /api/jobs` body. */
export type JobCreate = z.infer<typeof jobCreateSchema>;
/** `POST /api/jobs` body as a form sends it (defaults not yet applied). */
export type JobCreateInput = z.input<typeof jobCreateSchema>;

/** `PATCH /api/jobs/:id` body: any subset of the fields, plus the version last read. */
export const jobUpdateSchema = z
  .object({
    number: jobNumberSchema.optional(),
    title: textField(200).optional(),
    client: textField(200).optional(),
    site: textSchema().trim().max(200).optional(),
    units: jobUnitsSchema.optional(),
    spec: jobSpecSchema.optional(),
    status: jobStatusSchema.exclude(['archived']).optional(),
    version: z.number().int().min(1),
  })
  .strict();
/** Parsed `PATCH /api/jobs/:id` body. */
export type JobUpdate = z.infer<typeof jobUpdateSchema>;

/** Optional body of the archive endpoints: the version last read, to refuse stale archiving. */
export const archiveSchema = z.object({ version: z.number().int().min(1).optional() }).strict();
/** Parsed archive body. */
export type Archive = z.infer<typeof archiveSchema>;

/** Sortable job list fields; the first is the default. */
export const JOB_SORT_FIELDS = ['number', 'title', 'client', 'status', 'createdAt', 'updatedAt'] as const;

/**
 * `GET /api/jobs` query. Archived jobs are left out unless `includeArchived=true`
 * or `status=archived`.
 */
export const jobListQuerySchema = listQuerySchema(JOB_SORT_FIELDS).extend({
  status: jobStatusSchema.optional(),
  includeArchived: queryBooleanSchema.optional(),
});
/** Parsed job list query. */
export type JobListQuery = z.infer<typeof jobListQuerySchema>;
