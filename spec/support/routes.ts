import type { Express } from 'express';

export interface RouteInfo {
  readonly method: string;
  readonly path: string;
}

interface LayerLike {
  readonly rawPath?: unknown;
  readonly route?: { path: unknown; methods: Record<string, boolean> };
  readonly handle?: { stack?: LayerLike[] };
}

/**
 * Every route an Express 5 app answers, found by walking its router (mounted routers included),
 * so a spec that must hit "every route" cannot miss one added later.
 */
export function listRoutes(app: Express): RouteInfo[] {
  const routes: RouteInfo[] = [];
  const walk = (stack: LayerLike[], prefix: string) => {
    for (const layer of stack) {
      const here = typeof layer.rawPath === 'string' && layer.rawPath !== '/' ? layer.rawPath : '';
      if (layer.route && typeof layer.route.path === 'string') {
        for (const method of Object.keys(layer.route.methods)) {
          if (method !== '_all') routes.push({ method: method.toUpperCase(), path: `${prefix}${layer.route.path === '/' ? '' : layer.route.path}` || '/' });
        }
      } else if (layer.handle?.stack) {
        walk(layer.handle.stack, `${prefix}${here}`);
      }
    }
  };
  walk((app as unknown as { router: { stack: LayerLike[] } }).router.stack, '');
  return routes.filter((route, index) => routes.findIndex((other) => other.method === route.method && other.path === route.path) === index);
}
