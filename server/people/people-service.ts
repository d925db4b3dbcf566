import type { z } from 'zod';
import type { Person } from '../../src/shared/people-contract';
import type { Principal } from '../auth/principal';
import { hashSecret, verifySecret } from '../auth/secrets';
import type { UserRow } from '../db/tables';
import { conflict, forbidden, notFound } from '../http/http-error';
import type { PeopleRepository } from './people-repository';
import type { personCreate, personUpdate } from './people-schemas';

type PersonView = Person;

const view = (row: UserRow): PersonView => ({
  id: row.id,
  name: row.name,
  email: row.email,
  role: row.role,
  active: Boolean(row.active),
  hasPin: row.pin_hash !== null,
  hasPassword: row.password_hash !== null,
});

/** The rules for adding people and changing their sign-ins. */
export class PeopleService {
  constructor(private readonly people: PeopleRepository) {}

  /** Everyone in the shop. */
  async list(): Promise<PersonView[]> {
    return (await this.people.list()).map(view);
  }

  /** Adds an owner or lead (e-mail and password) or an operator (PIN). */
  async create(input: z.infer<typeof personCreate>): Promise<PersonView> {
    if (input.role === 'operator') {
      await this.refuseTakenPin(input.pin);
      const id = await this.people.insert({ name: input.name, email: null, role: 'operator', password_hash: null, pin_hash: await hashSecret(input.pin) });
      return view((await this.people.find(id))!);
    }
    if (await this.people.findByEmail(input.email)) throw conflict(`Someone already signs in with ${input.email}. Use another e-mail.`);
    const id = await this.people.insert({ name: input.name, email: input.email, role: input.role, password_hash: await hashSecret(input.password), pin_hash: null });
    return view((await this.people.find(id))!);
  }

  /** Renames, changes the role or e-mail of, or (de)activates a person. */
  async update(actor: Principal, id: number, changes: z.infer<typeof personUpdate>): Promise<PersonView> {
    const person = await this.findOr404(id);
    const losesOwner = person.role === 'owner' && Boolean(person.active) && (changes.active === false || (changes.role && changes.role !== 'owner'));
    if (losesOwner && (await this.people.activeOwners()) <= 1) {
      throw conflict('The shop needs at least one active owner. Make someone else owner first.');
    }
    if (actor.userId === id && changes.active === false) throw conflict('You cannot deactivate yourself. Ask another owner.');
    if (changes.email && (await this.people.findByEmail(changes.email, id))) throw conflict(`Someone already signs in with ${changes.email}. Use another e-mail.`);
    const role = changes.role ?? person.role;
    if (role !== 'operator' && !(changes.email ?? person.email)) {
      throw conflict('An owner or lead signs in by e-mail: give them an e-mail address and a password first.');
    }
    await this.people.update(id, changes);
    if (changes.active === false || changes.role) await this.people.endSessionsOf(id);
    return view((await this.people.find(id))!);
  }

  /** Sets an operator's PIN (owners and leads may; a PIN no other active operator uses). */
  async resetPin(id: number, pin: string): Promise<PersonView> {
    const person = await this.findOr404(id);
    if (person.role !== 'operator') throw conflict(`${person.name} signs in by e-mail, not with a PIN.`);
    await this.refuseTakenPin(pin, id);
    await this.people.update(id, { pin_hash: await hashSecret(pin) });
    await this.people.endSessionsOf(id);
    return view((await this.people.find(id))!);
  }

  /** Sets an owner's or lead's password (owners only) and signs them out everywhere. */
  async resetPassword(actor: Principal, id: number, password: string): Promise<PersonView> {
    const person = await this.findOr404(id);
    if (person.role === 'operator') throw conflict(`${person.name} signs in with a PIN, not a password.`);
    if (actor.role !== 'owner') throw forbidden();
    await this.people.update(id, { password_hash: await hashSecret(password) });
    if (actor.userId !== id) await this.people.endSessionsOf(id);
    return view((await this.people.find(id))!);
  }

  private async findOr404(id: number): Promise<UserRow> {
    const person = await this.people.find(id);
    if (!person) throw notFound(`There is no person ${id}. Reload the People screen.`);
    return person;
  }

  // PINs are typed without a name on a busy floor, so two operators must never share one.
  private async refuseTakenPin(pin: string, exceptId?: number): Promise<void> {
    for (const hash of await this.people.otherOperatorPinHashes(exceptId)) {
      if (await verifySecret(pin, hash)) throw conflict('Another operator already uses that PIN. Choose a different one.');
    }
  }
}
