import type { INestApplication } from '@nestjs/common';
import type { App } from 'supertest/types';
import { OPENAPI_PATH } from '../../src/openapi/openapi';

/**
 * "METHOD /path" of every API route Express has registered, but for the OpenAPI document's own
 * pages under /api/docs (public, served by @nestjs/swagger).
 */
export function routesOf(app: INestApplication<App>): Set<string> {
  type Router = { stack: { route?: { path: string; methods: Record<string, boolean> } }[] };
  // Express 5 keeps its router at `router` (Express 4 had `_router`).
  const router = (app.getHttpAdapter().getInstance() as { router: Router }).router;
  const routes = new Set<string>();
  for (const layer of router.stack) {
    const path = layer.route?.path;
    // The catch-all that answers unknown /api paths with a JSON 404 is not a route of its own.
    if (!path || path === '/api' || path.includes('{*')) continue;
    if (path === `/${OPENAPI_PATH}` || path.startsWith(`/${OPENAPI_PATH}/`)) continue;
    for (const method of Object.keys(layer.route!.methods)) {
      routes.add(`${method.toUpperCase()} ${path}`);
    }
  }
  return routes;
}
