import type { Principal } from '../auth/principal';
import { forbidden } from '../http/http-error';

/**
 * Owners and leads may plan and confirm cuts from anywhere; an operator only from a cut station.
 * Checked after the request is read, so the role matrix still sees every operator past the guard.
 */
export function requireCutFloor(principal: Principal): void {
  if (principal.role === 'operator' && principal.station?.kind !== 'cut') {
    throw forbidden('Only a cut station can record cuts, test cuts and blade changes. Use the tablet at the cutter, or ask a lead.');
  }
}
