import type { Customer } from '../../src/shared/intake-contract';
import type { CustomerRow } from '../db/tables';

/** A customer row as the API shows it to owners and leads. */
export const toCustomer = (row: CustomerRow): Customer => ({
  id: row.id,
  name: row.name,
  contactName: row.contact_name,
  email: row.email,
  phone: row.phone,
});
