import { z } from 'zod';
import { idSchema, timestampSchema } from './id.schema';
import { spoolStatusSchema } from './spool-status.schema';
import { findTextProblems, textSchema } from './text.schema';

/** A revision's life: one working draft per spool; issued ones never change; superseded when the next is issued. */
export const revisionStateSchema = z.enum(['draft', 'issued', 'superseded']);
/** Revision state. */
export type RevisionState = z.infer<typeof revisionStateSchema>;

/**
 * The design document envelope: any JSON object. The server checks its content
 * against the spool design schema separately (422 when it fails).
 */
export const designEnvelopeSchema = z.record(z.string(), z.unknown()).superRefine((design, ctx) => {
  // Text the database cannot hold is a bad request wherever it sits in the document.
  for (const { path, message } of findTextProblems(design)) ctx.addIssue({ code: 'custom', path, message });
});

/** A revision in a list: everything but the design. */
export const revisionSummarySchema = z.object({
  id: idSchema,
  spoolId: idSchema,
  letter: z.string(),
  state: revisionStateSchema,
  note: z.string(),
  author: z.object({ id: idSchema, displayName: z.string() }),
  createdAt: timestampSchema,
  updatedAt: timestampSchema,
  issuedAt: timestampSchema.nullable(),
  version: z.number().int(),
});
/** A revision without its design. */
export type RevisionSummary = z.infer<typeof revisionSummarySchema>;

/** A revision with its design document. */
export const revisionSchema = revisionSummarySchema.extend({ design: designEnvelopeSchema });
/** A revision with its design document. */
export type Revision = z.infer<typeof revisionSchema>;

/** Route params `/api/spools/:id/revisions/:revisionId`. */
export const revisionParamsSchema = z.object({ id: idSchema, revisionId: idSchema }).strict();

/** Revision note: why this revision exists. */
export const revisionNoteSchema = textSchema().trim().max(2000);

/** `PUT /api/spools/:id/draft` body: the whole design, the note, and the draft version last read. */
export const draftSaveSchema = z
  .object({
    design: designEnvelopeSchema,
    note: revisionNoteSchema.optional(),
    version: z.number().int().min(1),
  })
  .strict();
/** Parsed draft save body. */
export type DraftSave = z.infer<typeof draftSaveSchema>;

/**
 * `POST /api/spools/:id/draft/issue` body. `version`, when sent, must match the draft's.
 * Issuing over work the bay has done sends the spool back a stage: the server answers 409
 * `rework_confirmation_required` naming that stage until `confirmReworkTo` names it too.
 */
export const draftIssueSchema = z
  .object({
    note: revisionNoteSchema.optional(),
    version: z.number().int().min(1).optional(),
    confirmReworkTo: spoolStatusSchema.optional(),
  })
  .strict();
/** Parsed draft issue body. */
export type DraftIssue = z.infer<typeof draftIssueSchema>;

/**
 * `details` of the 409 `rework_confirmation_required` answer: the spool's status, the one
 * issuing would send it back to, the two letters and what changed (one line each).
 */
export const reworkConfirmationSchema = z.object({
  from: spoolStatusSchema,
  to: spoolStatusSchema,
  letter: z.string(),
  sinceLetter: z.string(),
  changes: z.array(z.string()),
});
/** What issuing over work in progress would do, for the confirmation. */
export type ReworkConfirmation = z.infer<typeof reworkConfirmationSchema>;
