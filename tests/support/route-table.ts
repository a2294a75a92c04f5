import type { Router } from 'express';
import { API_ROUTERS } from '../../server/api-routers.ts';
import { healthRouter } from '../../server/modules/health/health-router.ts';

export type ApiRoute = { method: 'get' | 'post' | 'put' | 'patch' | 'delete'; path: string };

function routesOf(router: Router): ApiRoute[] {
  const out: ApiRoute[] = [];
  for (const layer of (router as unknown as { stack: { route?: { path: string; methods: Record<string, boolean> } }[] }).stack) {
    if (!layer.route) continue;
    for (const method of Object.keys(layer.route.methods)) out.push({ method: method as ApiRoute['method'], path: layer.route.path });
  }
  return out;
}

/**
 * Every API route the app mounts, read from the routers themselves, so a new
 * route is covered by the generated security tests the moment it exists.
 */
export function apiRoutes(): ApiRoute[] {
  return [...API_ROUTERS.flatMap(routesOf), ...routesOf(healthRouter)];
}

const SAMPLE_PARAMS: Record<string, string> = {
  token: 'A'.repeat(43),
  variant: 'thumb',
};

/** A concrete URL for a route: the given workshop, random ids for everything else. */
export function urlFor(route: ApiRoute, workshopId: string): string {
  return `/api${route.path.replace(/:([A-Za-z]+)/g, (_m, name: string) =>
    name === 'workshopId' ? workshopId : (SAMPLE_PARAMS[name] ?? crypto.randomUUID()),
  )}`;
}

export const isStateChanging = (r: ApiRoute) => r.method !== 'get';
