/** A person as the People screen shows them (never a hash). */
export interface Person {
  id: number;
  name: string;
  email: string | null;
  role: 'owner' | 'lead' | 'operator';
  active: boolean;
  hasPin: boolean;
  hasPassword: boolean;
}

/** POST /api/people: owners and leads sign in by e-mail and password, operators with a PIN. */
export type PersonCreate =
  | { role: 'operator'; name: string; pin: string }
  | { role: 'owner' | 'lead'; name: string; email: string; password: string };

/** PATCH /api/people/:id */
export type PersonUpdate = Partial<Pick<Person, 'name' | 'email' | 'role' | 'active'>>;
