import type { RequestHandler } from 'express';
import type { SessionReply, StationSummary } from '../../src/shared/auth-contract';
import type { Role } from '../../src/shared/names';
import type { Db } from '../db/tables';

/** What the session cookie's server-side record says about who is signed in. */
export type SessionPrincipal =
  | { kind: 'person'; userId: number }
  | { kind: 'operator'; userId: number; stationId: number; deviceTokenHash: string }
  | { kind: 'display'; displayId: number };

declare module 'express-session' {
  interface SessionData {
    principal?: SessionPrincipal;
  }
}

/** Who is making this request, checked against the database on every request. */
export interface Principal {
  role: Role;
  userId: number | null;
  displayId: number | null;
  name: string;
  email: string | null;
  station: StationSummary | null;
}

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    interface Request {
      principal?: Principal;
    }
  }
}

/** Resolves a session's principal, or null when the person was deactivated or the tablet unpaired since. */
export async function resolvePrincipal(db: Db, stored: SessionPrincipal): Promise<Principal | null> {
  if (stored.kind === 'display') {
    const display = await db('displays').where({ id: stored.displayId }).whereNull('revoked_at').first();
    return display
      ? { role: 'display', userId: null, displayId: display.id, name: display.name, email: null, station: null }
      : null;
  }
  const user = await db('users').where({ id: stored.userId, active: true }).first();
  if (!user) return null;
  if (stored.kind === 'person') {
    if (user.role === 'operator') return null;
    return { role: user.role, userId: user.id, displayId: null, name: user.name, email: user.email, station: null };
  }
  const station = await db('stations')
    .where({ id: stored.stationId, device_token_hash: stored.deviceTokenHash })
    .first();
  if (!station || user.role !== 'operator') return null;
  return {
    role: 'operator',
    userId: user.id,
    displayId: null,
    name: user.name,
    email: user.email,
    station: { id: station.id, name: station.name, kind: station.kind },
  };
}

/** Middleware: sets req.principal from the session, and ends a session whose principal is gone. */
export function loadPrincipal(db: Db): RequestHandler {
  return async (req, _res, next) => {
    const stored = req.session?.principal;
    if (stored) {
      const principal = await resolvePrincipal(db, stored);
      if (principal) req.principal = principal;
      else delete req.session.principal;
    }
    next();
  };
}

/** The JSON shape sign-in calls and GET /api/auth/me answer with. */
export function sessionReply(principal: Principal): SessionReply {
  return {
    user: {
      id: principal.userId ?? principal.displayId ?? 0,
      name: principal.name,
      email: principal.email,
      role: principal.role,
    },
    station: principal.station,
  };
}
