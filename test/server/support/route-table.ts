import type { Express, RequestHandler } from 'express';
import type { Role } from '../../../src/shared/names';

/** One route as registered on the Express router, with what its guards say. */
export interface RegisteredRoute {
  method: string;
  path: string;
  allowedRoles: readonly Role[] | null;
  publicBecause: string | null;
}

interface Layer {
  rawPath?: string;
  handle: RequestHandler & { stack?: Layer[]; allowedRoles?: readonly Role[]; publicBecause?: string };
  route?: { path: string; methods: Record<string, boolean>; stack: Layer[] };
}

function walk(stack: Layer[], prefix: string, out: RegisteredRoute[]): void {
  for (const layer of stack) {
    if (layer.route) {
      const guards = layer.route.stack.map((inner) => inner.handle);
      const roleGuard = guards.find((handle) => Array.isArray(handle.allowedRoles));
      const marker = guards.find((handle) => typeof handle.publicBecause === 'string');
      for (const method of Object.keys(layer.route.methods)) {
        out.push({
          method: method.toUpperCase(),
          path: prefix + layer.route.path,
          allowedRoles: roleGuard?.allowedRoles ?? null,
          publicBecause: marker?.publicBecause ?? null,
        });
      }
    } else if (layer.handle.stack) {
      // A router mounted without a path has rawPath "/": it adds nothing to the prefix.
      walk(layer.handle.stack, prefix + (layer.rawPath === '/' ? '' : (layer.rawPath ?? '')), out);
    }
  }
}

/** Every route the app has registered, read from its router (not listed by hand). */
export function registeredRoutes(app: Express): RegisteredRoute[] {
  const out: RegisteredRoute[] = [];
  walk((app as unknown as { router: { stack: Layer[] } }).router.stack, '', out);
  return out;
}
