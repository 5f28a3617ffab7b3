import { RequestMethod, type INestApplication } from '@nestjs/common';
import { METHOD_METADATA, PATH_METADATA } from '@nestjs/common/constants.js';
import { DiscoveryService, Reflector } from '@nestjs/core';
import { policyOf, type RoutePolicy } from '../../auth/policy.js';

export interface RouteInfo {
  method: string;
  /** Full path with the /api prefix and `:params`, e.g. /api/users/:id. */
  path: string;
  controller: string;
  handler: string;
  policy: RoutePolicy | undefined;
}

const join = (...parts: string[]) =>
  '/' +
  parts
    .flatMap((p) => p.split('/'))
    .filter(Boolean)
    .join('/');

/**
 * Every route of every controller in the app with its declared policy, found through Nest's
 * DiscoveryService (the AppModule imports DiscoveryModule). Used by the route-policy tests.
 */
export function listRoutes(app: INestApplication, prefix = 'api'): RouteInfo[] {
  const discovery = app.get(DiscoveryService);
  const reflector = app.get(Reflector);
  const routes: RouteInfo[] = [];
  for (const wrapper of discovery.getControllers()) {
    const controller = wrapper.metatype as (new (...args: never[]) => unknown) | null;
    if (!controller) continue;
    const base =
      (Reflect.getMetadata(PATH_METADATA, controller) as string | string[] | undefined) ?? '';
    const proto = controller.prototype as Record<string, unknown>;
    for (const name of Object.getOwnPropertyNames(proto)) {
      const handler = proto[name];
      if (name === 'constructor' || typeof handler !== 'function') continue;
      const method = Reflect.getMetadata(METHOD_METADATA, handler) as RequestMethod | undefined;
      if (method === undefined) continue;
      const sub =
        (Reflect.getMetadata(PATH_METADATA, handler) as string | string[] | undefined) ?? '';
      for (const b of [base].flat()) {
        for (const s of [sub].flat()) {
          routes.push({
            method: RequestMethod[method],
            path: join(prefix, b, s),
            controller: controller.name,
            handler: name,
            policy: policyOf(reflector, handler, controller),
          });
        }
      }
    }
  }
  return routes.sort((a, b) => a.path.localeCompare(b.path) || a.method.localeCompare(b.method));
}
