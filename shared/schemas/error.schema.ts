import { z } from 'zod';

/** Stable machine-readable error codes the API answers with (see docs/api.md). */
export const errorCodeSchema = z.enum([
  'invalid_request',
  'unauthenticated',
  'forbidden',
  'reauthentication_failed',
  'not_found',
  'duplicate',
  'stale_version',
  'rework_confirmation_required',
  'job_archived',
  'already_issued',
  'payload_too_large',
  'unprocessable',
  'too_many_attempts',
  'service_unavailable',
  'internal_error',
]);
/** One of the API's error codes. */
export type ErrorCode = z.infer<typeof errorCodeSchema>;

/** The one error shape every non-2xx API answer carries. */
export const errorBodySchema = z.object({
  error: z.object({
    code: errorCodeSchema,
    message: z.string(),
    details: z.unknown().optional(),
  }),
});
/** Parsed API error body. */
export type ErrorBody = z.infer<typeof errorBodySchema>;
