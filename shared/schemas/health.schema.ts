import { z } from 'zod';

/** `GET /api/health`: whether the server and its database answer. */
export const healthSchema = z.object({
  status: z.enum(['ok', 'degraded']),
  database: z.enum(['up', 'down']),
});
/** Parsed health answer. */
export type Health = z.infer<typeof healthSchema>;
