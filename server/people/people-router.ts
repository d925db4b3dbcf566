import { Router } from 'express';
import { allowRoles } from '../auth/guards';
import type { Db } from '../db/tables';
import { idParams, validate } from '../http/validate';
import { PeopleRepository } from './people-repository';
import { passwordReset, personCreate, personUpdate, pinReset } from './people-schemas';
import { PeopleService } from './people-service';

const personParams = idParams('person');

/** /api/people: the owner manages who works in the shop; a lead may reset an operator's PIN. */
export function peopleRouter(db: Db): Router {
  const router = Router();
  const people = new PeopleService(new PeopleRepository(db));
  const owner = allowRoles('owner');

  router.get('/', allowRoles('owner', 'lead'), async (_req, res) => {
    res.json(await people.list());
  });

  router.post('/', owner, async (req, res) => {
    res.status(201).json(await people.create(validate(personCreate, req.body, 'new person')));
  });

  router.patch('/:id', owner, async (req, res) => {
    const { id } = validate(personParams, req.params, 'person address');
    res.json(await people.update(req.principal!, id, validate(personUpdate, req.body, 'change')));
  });

  router.post('/:id/pin', allowRoles('owner', 'lead'), async (req, res) => {
    const { id } = validate(personParams, req.params, 'person address');
    res.json(await people.resetPin(id, validate(pinReset, req.body, 'new PIN').pin));
  });

  router.post('/:id/password', owner, async (req, res) => {
    const { id } = validate(personParams, req.params, 'person address');
    res.json(await people.resetPassword(req.principal!, id, validate(passwordReset, req.body, 'new password').password));
  });

  return router;
}
