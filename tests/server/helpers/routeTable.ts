import type { Express } from 'express';

interface StackLayer {
  route?: { path: string; methods: Record<string, boolean> };
  handle?: { stack?: StackLayer[] };
  /** The path a router was mounted on (Express 5's router keeps it as given). */
  rawPath?: string;
}

/** Every route the app really serves, as "METHOD /path/:param", read from Express's own router stack. */
export function routeTable(app: Express): string[] {
  const out: string[] = [];
  const walk = (stack: StackLayer[], prefix: string) => {
    for (const layer of stack) {
      if (layer.route) {
        const path = `${prefix}${layer.route.path === '/' ? '' : layer.route.path}` || '/';
        for (const method of Object.keys(layer.route.methods)) if (method !== '_all') out.push(`${method.toUpperCase()} ${path}`);
      } else if (layer.handle?.stack) {
        walk(layer.handle.stack, `${prefix}${typeof layer.rawPath === 'string' && layer.rawPath !== '/' ? layer.rawPath : ''}`);
      }
    }
  };
  walk((app as unknown as { router: { stack: StackLayer[] } }).router.stack, '');
  return [...new Set(out)].sort();
}
