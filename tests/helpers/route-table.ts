import type { Router } from 'express';

interface Layer {
  route?: { path: string; methods: Record<string, boolean> };
  handle?: { stack?: Layer[] };
}

/** Every "METHOD /path" the API router serves, read from Express itself (so no route can hide from the matrix). */
export function listRoutes(api: Router): string[] {
  const out: string[] = [];
  const walk = (stack: Layer[]) => {
    for (const layer of stack) {
      if (layer.route) {
        for (const [method, on] of Object.entries(layer.route.methods)) {
          if (on && method !== '_all') out.push(`${method.toUpperCase()} ${layer.route.path}`);
        }
      } else if (layer.handle?.stack) walk(layer.handle.stack);
    }
  };
  walk((api as unknown as { stack: Layer[] }).stack);
  return [...new Set(out)].sort();
}
