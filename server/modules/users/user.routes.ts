import { Router } from 'express';
import { idParam } from '../../../shared/schemas/common';
import { createPersonInput, setPinInput, updatePersonInput } from '../../../shared/schemas/people';
import { actorOf, requirePermission } from '../../auth/require';
import { validate, validated } from '../../middleware/validate';
import { presentPerson } from './user.presenter';
import type { UserService } from './user.service';

export function userRoutes(service: UserService) {
  const r = Router();
  r.use(requirePermission('people:manage'));
  r.get('/', async (req, res) => {
    res.json({ users: (await service.list(actorOf(req))).map(presentPerson) });
  });
  r.post('/', validate({ body: createPersonInput }), async (req, res) => {
    res.status(201).json({ user: presentPerson(await service.create(actorOf(req), req.body)) });
  });
  r.patch('/:id', ...validated({ params: idParam, body: updatePersonInput }, async ({ params, body }, req, res) => {
    res.json({ user: presentPerson(await service.update(actorOf(req), params.id, body)) });
  }));
  r.post('/:id/pin', ...validated({ params: idParam, body: setPinInput }, async ({ params, body }, req, res) => {
    res.json({ user: presentPerson(await service.setPin(actorOf(req), params.id, body)) });
  }));
  r.post('/:id/unlock', ...validated({ params: idParam }, async ({ params }, req, res) => {
    res.json({ user: presentPerson(await service.unlock(actorOf(req), params.id)) });
  }));
  return r;
}
