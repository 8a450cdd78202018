import type { Express } from 'express';

interface Layer {
  route?: { path: string; methods: Record<string, boolean> };
  handle?: { stack?: Layer[] };
  rawPath?: unknown;
}

/**
 * Every route registered in the Express app under /api, as "METHOD /api/path", found by walking
 * the router stacks (nested routers contribute their mount paths).
 */
export function listApiRoutes(app: Express): string[] {
  const found: string[] = [];
  const walk = (stack: Layer[], prefix: string) => {
    for (const layer of stack) {
      if (layer.route) {
        for (const method of Object.keys(layer.route.methods)) {
          if (method !== '_all') found.push(`${method.toUpperCase()} ${prefix}${layer.route.path}`);
        }
      } else if (layer.handle?.stack) {
        const mount = typeof layer.rawPath === 'string' && layer.rawPath !== '/' ? layer.rawPath : '';
        walk(layer.handle.stack, prefix + mount);
      }
    }
  };
  walk((app as unknown as { router: { stack: Layer[] } }).router.stack, '');
  return found.filter((route) => route.split(' ')[1]?.startsWith('/api/'));
}
