import { Router } from 'express';
import { z } from 'zod';
import { idParamsSchema } from '../../../shared/schemas/id.schema';
import {
  draftIssueSchema,
  draftSaveSchema,
  revisionParamsSchema,
} from '../../../shared/schemas/revision.schema';
import { ANY_ROLE, requireRole } from '../../common/auth.middleware';
import { actorOf } from '../../common/session-actor';
import { inputOf, validate } from '../../common/validate.middleware';
import type { RevisionService } from './revision.service';

const list = { params: idParamsSchema };
const one = { params: revisionParamsSchema };
const open = { params: idParamsSchema, body: z.object({}).strict() };
const save = { params: idParamsSchema, body: draftSaveSchema };
const issue = { params: idParamsSchema, body: draftIssueSchema };

/** /api/spools/:id/revisions and /api/spools/:id/draft. Everyone reads; admins and detailers draft and issue. */
export function revisionRouter(revisions: RevisionService): Router {
  const router = Router();
  const read = requireRole(...ANY_ROLE);
  const write = requireRole('admin', 'detailer');

  router.get('/:id/revisions', read, validate(list), async (req, res) => {
    res.json({ items: await revisions.list(actorOf(req), inputOf(res, list).params.id) });
  });
  router.get('/:id/revisions/:revisionId', read, validate(one), async (req, res) => {
    const { params } = inputOf(res, one);
    res.json(await revisions.get(actorOf(req), params.id, params.revisionId));
  });
  router.post('/:id/draft', write, validate(open), async (req, res) => {
    const { created, draft } = await revisions.openDraft(actorOf(req), inputOf(res, open).params.id);
    res.status(created ? 201 : 200).json(draft);
  });
  router.put('/:id/draft', write, validate(save), async (req, res) => {
    const { params, body } = inputOf(res, save);
    res.json(await revisions.saveDraft(actorOf(req), params.id, body));
  });
  router.post('/:id/draft/issue', write, validate(issue), async (req, res) => {
    const { params, body } = inputOf(res, issue);
    res.json(await revisions.issueDraft(actorOf(req), params.id, body));
  });
  return router;
}
