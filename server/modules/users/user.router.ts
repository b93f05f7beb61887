import { Router } from 'express';
import { idParamsSchema } from '../../../shared/schemas/id.schema';
import {
  passwordResetSchema,
  userCreateSchema,
  userListQuerySchema,
  userUpdateSchema,
} from '../../../shared/schemas/user.schema';
import { requireRole } from '../../common/auth.middleware';
import { actorOf } from '../../common/session-actor';
import { inputOf, validate } from '../../common/validate.middleware';
import type { Reauthenticator } from '../auth/reauthenticate';
import type { UserService } from './user.service';

const list = { query: userListQuerySchema };
const one = { params: idParamsSchema };
const create = { body: userCreateSchema };
const update = { params: idParamsSchema, body: userUpdateSchema };
const reset = { params: idParamsSchema, body: passwordResetSchema };

/**
 * /api/users: the shop's accounts. Admins only; every write also carries the admin's own
 * `currentPassword`, checked before anything is written.
 */
export function userRouter(users: UserService, reauth: Reauthenticator): Router {
  const router = Router();
  router.use(requireRole('admin'));

  router.get('/', validate(list), async (req, res) => {
    res.json(await users.list(actorOf(req), inputOf(res, list).query));
  });
  router.post('/', validate(create), async (req, res) => {
    const { body } = inputOf(res, create);
    await reauth.confirm(actorOf(req), body.currentPassword, req.ip, res);
    res.status(201).json(await users.create(actorOf(req), body));
  });
  router.get('/:id', validate(one), async (req, res) => {
    res.json(await users.get(actorOf(req), inputOf(res, one).params.id));
  });
  router.patch('/:id', validate(update), async (req, res) => {
    const { params, body } = inputOf(res, update);
    await reauth.confirm(actorOf(req), body.currentPassword, req.ip, res);
    res.json(await users.update(actorOf(req), params.id, body));
  });
  router.post('/:id/reset-password', validate(reset), async (req, res) => {
    const { params, body } = inputOf(res, reset);
    await reauth.confirm(actorOf(req), body.currentPassword, req.ip, res);
    await users.resetPassword(actorOf(req), params.id, body.password, req.sessionID);
    res.status(204).end();
  });
  return router;
}
