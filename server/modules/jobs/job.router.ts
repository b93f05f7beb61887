import { Router } from 'express';
import { idParamsSchema } from '../../../shared/schemas/id.schema';
import {
  archiveSchema,
  jobCreateSchema,
  jobListQuerySchema,
  jobUpdateSchema,
} from '../../../shared/schemas/job.schema';
import { ANY_ROLE, requireRole } from '../../common/auth.middleware';
import { actorOf } from '../../common/session-actor';
import { inputOf, validate } from '../../common/validate.middleware';
import type { JobService } from './job.service';

const list = { query: jobListQuerySchema };
const one = { params: idParamsSchema };
const create = { body: jobCreateSchema };
const update = { params: idParamsSchema, body: jobUpdateSchema };
const archive = { params: idParamsSchema, body: archiveSchema };

/** /api/jobs. Everyone in the shop reads; admins and detailers write. */
export function jobRouter(jobs: JobService): Router {
  const router = Router();
  const read = requireRole(...ANY_ROLE);
  const write = requireRole('admin', 'detailer');

  router.get('/', read, validate(list), async (req, res) => {
    res.json(await jobs.list(actorOf(req), inputOf(res, list).query));
  });
  router.post('/', write, validate(create), async (req, res) => {
    res.status(201).json(await jobs.create(actorOf(req), inputOf(res, create).body));
  });
  router.get('/:id', read, validate(one), async (req, res) => {
    res.json(await jobs.get(actorOf(req), inputOf(res, one).params.id));
  });
  router.patch('/:id', write, validate(update), async (req, res) => {
    const { params, body } = inputOf(res, update);
    res.json(await jobs.update(actorOf(req), params.id, body));
  });
  router.post('/:id/archive', write, validate(archive), async (req, res) => {
    const { params, body } = inputOf(res, archive);
    res.json(await jobs.archive(actorOf(req), params.id, body));
  });
  return router;
}
