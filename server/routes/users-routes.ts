import { Router } from 'express';
import { createUserBodySchema, updateUserBodySchema, userIdParamsSchema } from '#shared/schemas/users.ts';
import { parseWith } from '../http/validate.ts';
import { requireCapability } from '../http/require-capability.ts';
import type { UsersService } from '../services/users-service.ts';

/** /api/admin/users — staff accounts; admins only. */
export function usersRoutes(users: UsersService): Router {
  const router = Router();
  router.use('/admin/users', requireCapability('users.manage'));

  router.get('/admin/users', async (req, res) => {
    res.json({ users: await users.list(req.caller) });
  });

  router.post('/admin/users', async (req, res) => {
    const body = parseWith(createUserBodySchema, req.body);
    res.status(201).json({ user: await users.create(req.caller, body) });
  });

  router.patch('/admin/users/:id', async (req, res) => {
    const { id } = parseWith(userIdParamsSchema, req.params, 'params');
    const body = parseWith(updateUserBodySchema, req.body);
    res.json({ user: await users.update(req.caller, id, body) });
  });

  return router;
}
