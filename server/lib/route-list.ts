import type { Express } from 'express';

interface Layer {
  name?: string;
  rawPath?: unknown;
  slash?: boolean;
  route?: { path: unknown; methods: Record<string, boolean> };
  handle?: { stack?: Layer[] };
}

/**
 * Every route registered on the app, as `METHOD /path`, found by walking Express's router.
 * The role matrix test uses it so that a new route without a matrix row fails the build.
 */
export function listRoutes(app: Express): string[] {
  const stack = (app as unknown as { router: { stack: Layer[] } }).router.stack;
  return walk(stack, '').sort();
}

export function listApiRoutes(app: Express): string[] {
  return listRoutes(app).filter((route) => route.split(' ')[1].startsWith('/api/'));
}

function walk(stack: Layer[], prefix: string): string[] {
  return stack.flatMap((layer) => {
    if (layer.route) {
      const path = layer.route.path;
      if (typeof path !== 'string') throw new Error(`Route path ${String(path)} under ${prefix} is not a string`);
      return Object.keys(layer.route.methods)
        .filter((method) => method !== '_all')
        .map((method) => `${method.toUpperCase()} ${prefix}${path}`);
    }
    if (layer.handle?.stack) {
      if (layer.slash) return walk(layer.handle.stack, prefix);
      if (typeof layer.rawPath !== 'string')
        throw new Error(`A router under ${prefix} is mounted on a pattern, not a path`);
      return walk(layer.handle.stack, `${prefix}${layer.rawPath}`);
    }
    return [];
  });
}
