import type { Express } from 'express';

/** One method on one route of the app, as Express 5 holds it. */
export type AppRoute = {
  method: 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';
  /** The route's pattern as mounted, e.g. `/api/runs/:id/readings`. */
  pattern: string;
  /** Names of its `:param` and `*wildcard` parts, in order. */
  params: string[];
};

/** The parts of Express 5's router (router 2.x) that the walk reads; its published types predate them. */
type Layer = {
  rawPath?: unknown;
  route?: { path: unknown; methods: Record<string, boolean> };
  handle: { stack?: Layer[] };
};

const METHODS = ['GET', 'POST', 'PUT', 'PATCH', 'DELETE'] as const;
const PARAM = /[:*](\w+)/g;

/**
 * Every API route the app answers, read from its own router stack (nested routers included), so
 * a route added later is listed without anyone naming it here.
 */
export function appRoutes(app: Express): AppRoute[] {
  const stack = (app as unknown as { router: { stack: Layer[] } }).router.stack;
  return walk(stack, '').filter((route) => route.pattern.startsWith('/api/'));
}

function walk(stack: Layer[], prefix: string): AppRoute[] {
  return stack.flatMap((layer) => {
    if (layer.route) return routesOf(prefix + textPath(layer.route.path), layer.route.methods);
    if (!layer.handle.stack) return [];
    const mount = textPath(layer.rawPath);
    return walk(layer.handle.stack, prefix + (mount === '/' ? '' : mount));
  });
}

function routesOf(pattern: string, methods: Record<string, boolean>): AppRoute[] {
  const all = methods._all === true;
  const params = [...pattern.matchAll(PARAM)].map((match) => match[1]);
  return METHODS.filter((method) => all || methods[method.toLowerCase()]).map((method) => ({
    method,
    pattern,
    params,
  }));
}

/** A path the walk cannot read (a RegExp, a list) fails loudly rather than being left out. */
function textPath(path: unknown): string {
  if (typeof path !== 'string') throw new Error(`route path ${String(path)} is not text`);
  return path;
}

/**
 * The address for `route` with each parameter replaced by an already-encoded segment. Optional
 * groups (`{/:name}`) are filled in like the rest.
 */
export function fillPattern(route: AppRoute, segments: string[]): string {
  let next = 0;
  return route.pattern.replace(/[{}]/g, '').replace(PARAM, () => segments[next++] ?? '');
}

export const routeName = (route: AppRoute) => `${route.method} ${route.pattern}`;

export const isRead = (route: AppRoute) => route.method === 'GET';
