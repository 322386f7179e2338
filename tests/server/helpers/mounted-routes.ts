import { type Express } from 'express';

type Layer = {
  rawPath?: unknown;
  route?: { path: string; methods: Record<string, boolean> };
  handle?: { stack?: Layer[] };
};

/**
 * Every route the app has mounted, as `METHOD /path/:param`, found by walking Express's own
 * router stacks (so a route added anywhere shows up here whether or not anyone listed it).
 */
export function mountedRoutes(app: Express): string[] {
  const found: string[] = [];
  const walk = (stack: Layer[], prefix: string) => {
    for (const layer of stack) {
      const path = typeof layer.rawPath === 'string' && layer.rawPath !== '/' ? layer.rawPath : '';
      if (layer.route) {
        for (const method of Object.keys(layer.route.methods)) {
          if (method === '_all') continue;
          found.push(
            `${method.toUpperCase()} ${prefix}${layer.route.path === '/' && prefix ? '' : layer.route.path}`,
          );
        }
      } else if (layer.handle?.stack) {
        walk(layer.handle.stack, `${prefix}${path}`);
      }
    }
  };
  walk((app as unknown as { router: { stack: Layer[] } }).router.stack, '');
  return [...new Set(found)].sort();
}
