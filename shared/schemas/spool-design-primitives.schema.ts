import { z } from 'zod';
import { unsupportedFlangeClassMessage } from '../standards/flanges';

/**
 * Largest plant coordinate, mm (10 km each way from the plant origin): no plant is wider,
 * and a bound keeps every derived position, sheet scale and weight a finite, printable number.
 */
export const MAX_PLANT_COORDINATE_MM = 10_000_000;

const coordinateSchema = z
  .number()
  .finite()
  .min(-MAX_PLANT_COORDINATE_MM, 'Coordinates stay within 10 km of the plant origin')
  .max(MAX_PLANT_COORDINATE_MM, 'Coordinates stay within 10 km of the plant origin');

/**
 * A 3D vector or point in plant coordinates, millimetres: x = east, y = north, z = up.
 * Used for positions (mm) and for directions (any length; the engine normalises).
 */
export const vec3Schema = z
  .object({
    x: coordinateSchema,
    y: coordinateSchema,
    z: coordinateSchema,
  })
  .strict();
/** A plant-coordinate vector (see {@link vec3Schema}). */
export type Vec3 = z.infer<typeof vec3Schema>;

/** A direction: a {@link vec3Schema} that is not the zero vector. Length is ignored. */
export const directionSchema = vec3Schema.refine((v) => Math.hypot(v.x, v.y, v.z) > 1e-9, {
  message: 'Direction must not be the zero vector',
});

/**
 * Id of a node or run inside one design: short, stable, chosen by the editor
 * (e.g. `n1`, `r12`, a nanoid). Never reused for another component in the same design.
 */
export const elementIdSchema = z
  .string()
  .min(1, 'Id must not be empty')
  .max(64, 'Id must be at most 64 characters')
  .regex(/^[A-Za-z0-9_.:-]+$/, 'Id may use letters, digits, _ . : - only');
/** A node or run id. */
export type ElementId = z.infer<typeof elementIdSchema>;

/**
 * ASME B16.5 pressure class carried by Tackline's flange tables. Any other class is refused
 * with the list of supported ones: a class without a table is never read as another.
 */
export const flangeClassSchema = z.union([z.literal(150), z.literal(300), z.literal(600)], {
  error: (issue) => unsupportedFlangeClassMessage(issue.input),
});

/** Elbow radius: long = 1.5 × NPS, short = 1.0 × NPS (ASME B16.9). */
export const elbowRadiusSchema = z.enum(['long', 'short']);
/** Elbow radius class. */
export type ElbowRadius = z.infer<typeof elbowRadiusSchema>;
