import { Router } from 'express';
import { auditListQuerySchema } from '../../../shared/schemas/audit.schema';
import { requireRole } from '../../common/auth.middleware';
import { actorOf } from '../../common/session-actor';
import { inputOf, validate } from '../../common/validate.middleware';
import type { AuditQueryService } from './audit-query.service';

const list = { query: auditListQuerySchema };

/** /api/audit-events: the shop's audit trail, newest first. Admins only. */
export function auditRouter(audit: AuditQueryService): Router {
  const router = Router();
  router.get('/', requireRole('admin'), validate(list), async (req, res) => {
    res.json(await audit.list(actorOf(req), inputOf(res, list).query));
  });
  return router;
}
