import { secured } from '../auth/policy';
import { Router } from 'express';
import type { DataSource } from 'typeorm';
import type { Page } from '../../shared/contract/records';
import type { MeAnswer, UserRecord } from '../../shared/contract/users';
import { toUserRecord } from '../auth/auth.service';
import { fieldError } from '../common/errors';
import { UUID_RE } from '../common/fields';
import { body, refuseQuery } from '../common/validate';
import { User } from '../entities';
import { CreateUserDto, UpdateMeDto, UpdateUserDto } from './users.dto';
import { UsersService } from './users.service';

export function usersRouter(ds: DataSource): Router {
  const service = new UsersService(ds);
  const router = Router();
  const r = secured(router);

  r.get('/me', async (req, res) => {
    const user = await ds.getRepository(User).findOneByOrFail({ id: req.user!.id });
    res.json({ user: toUserRecord(user) } satisfies MeAnswer);
  });
  r.patch('/me', body(UpdateMeDto), async (req, res) => {
    res.json({ user: await service.updateMe(req.user!.id, req.body as UpdateMeDto) } satisfies MeAnswer);
  });

  r.get('/users', async (req, res) => {
    refuseQuery(req);
    const items = await service.list();
    res.json({ items, total: items.length, page: 1, pageSize: items.length } satisfies Page<UserRecord>);
  });
  r.post('/users', body(CreateUserDto), async (req, res) => {
    res.status(201).json(await service.create(req.body as CreateUserDto, req.user!.id));
  });
  r.patch('/users/:id', body(UpdateUserDto), async (req, res) => {
    const id = String(req.params.id);
    if (!UUID_RE.test(id)) throw fieldError('id', 'must be a user id');
    res.json(await service.update(id, req.body as UpdateUserDto, req.user!.id));
  });
  return router;
}
