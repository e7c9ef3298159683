import { Router } from 'express';
import { ChangeRoleBody, ListUsersQuery, UserIdParams } from '../../shared/schemas/user.schema.js';
import { currentUser, requireRole } from '../middleware/auth.js';
import type { UserService } from '../services/user.service.js';

/** `/api/users`: every account and role changes, for admins. */
export function userRouter(deps: { users: UserService }): Router {
  const r = Router();
  r.use(requireRole('admin'));

  r.get('/', async (req, res) => {
    res.json({ users: await deps.users.list(ListUsersQuery.parse(req.query)) });
  });

  r.patch('/:id/role', async (req, res) => {
    const { id } = UserIdParams.parse(req.params);
    res.json({ user: await deps.users.changeRole(currentUser(req).id, id, ChangeRoleBody.parse(req.body).role) });
  });
  return r;
}

/** `/api/volunteers`: who the volunteers are and whether their e-mail is confirmed, for coordinators. */
export function volunteerRouter(deps: { users: UserService }): Router {
  const r = Router();
  r.use(requireRole('coordinator', 'admin'));
  r.get('/', async (req, res) => {
    const { q } = ListUsersQuery.parse(req.query);
    res.json({ users: await deps.users.list({ q, role: 'volunteer' }) });
  });
  return r;
}
