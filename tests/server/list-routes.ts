import type { Express, RequestHandler } from 'express';

export type ServedRoute = { method: string; path: string; /** The route's last handler: the one that answers. */ last: RequestHandler };

/** Every route Express serves under /api (better-auth's aside): method, full path as Express holds it, and its answering handler. */
export function servedRoutes(app: Express): ServedRoute[] {
  const out: ServedRoute[] = [];
  const walk = (stack: any[], prefix: string) => {
    for (const layer of stack) {
      if (layer.route) {
        const last = layer.route.stack.at(-1).handle;
        for (const method of Object.keys(layer.route.methods)) out.push({ method: method.toUpperCase(), path: `${prefix}${layer.route.path}`, last });
      } else if (layer.handle?.stack) {
        walk(layer.handle.stack, prefix + (layer.rawPath ?? ''));
      }
    }
  };
  walk((app as any).router.stack, '');
  return out.filter((r) => r.path.startsWith('/api/') && !r.path.startsWith('/api/auth/'));
}

/** Every route Express serves under /api (better-auth's aside), as "GET /api/rigs/:rigId". */
export function listRoutes(app: Express): string[] {
  return servedRoutes(app).map((r) => `${r.method} ${r.path}`);
}
