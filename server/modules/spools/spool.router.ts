import { Router } from 'express';
import { idParamsSchema } from '../../../shared/schemas/id.schema';
import { archiveSchema } from '../../../shared/schemas/job.schema';
import { SPOOL_STATUS_ROLES } from '../../../shared/schemas/spool-status.schema';
import {
  jobSpoolsParamsSchema,
  REWORK_DONE_ROLES,
  reworkDoneSchema,
  spoolCreateSchema,
  spoolListQuerySchema,
  spoolStatusChangeSchema,
  spoolUpdateSchema,
} from '../../../shared/schemas/spool.schema';
import { ANY_ROLE, requireRole } from '../../common/auth.middleware';
import { actorOf } from '../../common/session-actor';
import { inputOf, validate } from '../../common/validate.middleware';
import type { SpoolService } from './spool.service';

const list = { params: jobSpoolsParamsSchema, query: spoolListQuerySchema };
const create = { params: jobSpoolsParamsSchema, body: spoolCreateSchema };
const one = { params: idParamsSchema };
const update = { params: idParamsSchema, body: spoolUpdateSchema };
const status = { params: idParamsSchema, body: spoolStatusChangeSchema };
const archive = { params: idParamsSchema, body: archiveSchema };
const reworkDone = { params: idParamsSchema, body: reworkDoneSchema };

/** /api/jobs/:jobId/spools: a job's spools. Everyone reads; admins and detailers add. */
export function jobSpoolRouter(spools: SpoolService): Router {
  const router = Router({ mergeParams: true });
  router.get('/', requireRole(...ANY_ROLE), validate(list), async (req, res) => {
    const { params, query } = inputOf(res, list);
    res.json(await spools.list(actorOf(req), params.jobId, query));
  });
  router.post('/', requireRole('admin', 'detailer'), validate(create), async (req, res) => {
    const { params, body } = inputOf(res, create);
    res.status(201).json(await spools.create(actorOf(req), params.jobId, body));
  });
  return router;
}

/** /api/spools/:id: one spool. Status moves are checked per role in the service. */
export function spoolRouter(spools: SpoolService): Router {
  const router = Router();
  const write = requireRole('admin', 'detailer');

  router.get('/:id', requireRole(...ANY_ROLE), validate(one), async (req, res) => {
    res.json(await spools.get(actorOf(req), inputOf(res, one).params.id));
  });
  router.patch('/:id', write, validate(update), async (req, res) => {
    const { params, body } = inputOf(res, update);
    res.json(await spools.update(actorOf(req), params.id, body));
  });
  router.post('/:id/status', requireRole(...SPOOL_STATUS_ROLES), validate(status), async (req, res) => {
    const { params, body } = inputOf(res, status);
    res.json(await spools.changeStatus(actorOf(req), params.id, body));
  });
  router.post('/:id/rework/done', requireRole(...REWORK_DONE_ROLES), validate(reworkDone), async (req, res) => {
    const { params, body } = inputOf(res, reworkDone);
    res.json(await spools.reworkDone(actorOf(req), params.id, body));
  });
  router.post('/:id/archive', write, validate(archive), async (req, res) => {
    const { params, body } = inputOf(res, archive);
    res.json(await spools.archive(actorOf(req), params.id, body));
  });
  return router;
}
