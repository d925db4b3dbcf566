import request from 'supertest';
import type TestAgent from 'supertest/lib/agent';
import { ROLES, type Role } from '../../src/shared/names';
import { registeredRoutes } from './support/route-table';
import { signedInDisplay, signedInOperator, signedInPerson, testApp } from './support/test-hub';

const hub = testApp();
const routes = registeredRoutes(hub.app);
const agents = new Map<Role, TestAgent>();

beforeAll(async () => {
  agents.set('owner', await signedInPerson(hub.app, 'owner'));
  agents.set('lead', await signedInPerson(hub.app, 'lead'));
  agents.set('operator', (await signedInOperator(hub.app, hub.db, 'Weed 2', 2)).agent);
  agents.set('display', await signedInDisplay(hub.app));
});
afterAll(() => hub.close());

// Path parameters get an id nothing has, so a route that passes its guard changes no shared rows.
const concrete = (path: string) => path.replace(/:[A-Za-z]+/g, '999999');

function send(agent: TestAgent | ReturnType<typeof request>, method: string, path: string) {
  const call = (agent as unknown as Record<string, (url: string) => request.Test>)[method.toLowerCase()]!(concrete(path));
  return method === 'GET' || method === 'DELETE' ? call : call.send({});
}

describe('the role matrix over every registered API route', () => {
  it('finds the routes from the router itself', () => {
    const paths = routes.map((route) => `${route.method} ${route.path}`);
    expect(paths).toEqual(expect.arrayContaining(['POST /api/auth/login', 'GET /api/auth/me', 'POST /api/stations/:id/pair']));
  });

  it('has a role guard or an explicit public marker on every route', () => {
    const unguarded = routes.filter((route) => !route.allowedRoles && !route.publicBecause).map((r) => `${r.method} ${r.path}`);
    expect(unguarded).toEqual([]);
  });

  const guarded = routes.filter((route) => route.allowedRoles);
  it.each(guarded.map((route) => [`${route.method} ${route.path}`, route] as const))(
    '%s answers 401 to nobody and 403 to every role it does not allow',
    async (_name, route) => {
      const anonymous = await send(request(hub.app), route.method, route.path);
      expect(anonymous.status).toBe(401);
      expect(anonymous.body.error).toEqual(expect.any(String));
      for (const role of ROLES.filter((r) => !route.allowedRoles!.includes(r))) {
        const res = await send(agents.get(role)!, route.method, route.path);
        expect({ role, status: res.status }).toEqual({ role, status: 403 });
        expect(res.body.error).toMatch(/role/);
      }
    },
  );

  it.each(guarded.map((route) => [`${route.method} ${route.path}`, route] as const))(
    '%s lets every role it allows past the guard',
    async (_name, route) => {
      for (const role of route.allowedRoles!) {
        const res = await send(agents.get(role)!, route.method, route.path);
        expect({ role, status: res.status }).not.toEqual({ role, status: 401 });
        expect({ role, status: res.status }).not.toEqual({ role, status: 403 });
      }
    },
  );
});
