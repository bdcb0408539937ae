import type { Express } from 'express';

/** Every route Express serves under /api (better-auth's aside): method and full path, as Express holds them. */
export function listRoutes(app: Express): string[] {
  const out: string[] = [];
  const walk = (stack: any[], prefix: string) => {
    for (const layer of stack) {
      if (layer.route) {
        for (const method of Object.keys(layer.route.methods)) out.push(`${method.toUpperCase()} ${prefix}${layer.route.path}`);
      } else if (layer.handle?.stack) {
        walk(layer.handle.stack, prefix + (layer.rawPath ?? ''));
      }
    }
  };
  walk((app as any).router.stack, '');
  return out.filter((r) => r.includes(' /api/') && !r.includes('/api/auth/'));
}
