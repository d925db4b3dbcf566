import type { DeviceReply } from '../../src/shared/auth-contract';
import { unauthorized } from '../http/http-error';
import type { AuthRepository } from './auth-repository';
import type { SessionPrincipal } from './principal';
import { hashDeviceToken, verifySecret } from './secrets';

const NOT_PAIRED = 'This tablet is not paired with a station (or was paired again elsewhere). Ask a lead to pair it.';

/** Checks credentials and says which principal they belong to. */
export class AuthService {
  constructor(private readonly repository: AuthRepository) {}

  /** E-mail and password for an owner or lead. */
  async checkPassword(email: string, password: string): Promise<SessionPrincipal> {
    const user = await this.repository.findPersonByEmail(email);
    const ok = await verifySecret(password, user?.password_hash ?? null);
    if (!user || !ok) throw unauthorized('That e-mail and password do not match. Check both and try again.');
    return { kind: 'person', userId: user.id };
  }

  /** What a paired tablet shows before a PIN: its station and who may sign in there. */
  async describeDevice(deviceToken: string): Promise<DeviceReply> {
    const station = await this.repository.findStationByTokenHash(hashDeviceToken(deviceToken));
    if (!station) throw unauthorized(NOT_PAIRED);
    const operators = await this.repository.listOperators();
    return {
      station: { id: station.id, name: station.name, kind: station.kind },
      operators: operators.map(({ id, name }) => ({ id, name })),
    };
  }

  /** A PIN on a paired tablet; with a userId only that operator's PIN is tried. */
  async checkPin(deviceToken: string, pin: string, userId?: number): Promise<SessionPrincipal> {
    const tokenHash = hashDeviceToken(deviceToken);
    const station = await this.repository.findStationByTokenHash(tokenHash);
    if (!station) throw unauthorized(NOT_PAIRED);
    const operators = (await this.repository.listOperators()).filter((op) => userId === undefined || op.id === userId);
    for (const operator of operators) {
      if (await verifySecret(pin, operator.pin_hash)) {
        await this.repository.touchStation(station.id);
        return { kind: 'operator', userId: operator.id, stationId: station.id, deviceTokenHash: tokenHash };
      }
    }
    if (operators.length === 0) await verifySecret(pin, null);
    throw unauthorized('That PIN is not right. Try again, or ask a lead to reset it.');
  }

  /** A wall display's device token. */
  async checkDisplay(deviceToken: string): Promise<SessionPrincipal> {
    const display = await this.repository.findDisplayByTokenHash(hashDeviceToken(deviceToken));
    if (!display) throw unauthorized('This display is not known to the hub. Ask a lead to set it up again.');
    return { kind: 'display', displayId: display.id };
  }
}
