import fs from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';

/**
 * The edge checks (origin rule, body types and limits) hold only if every API
 * route goes through the wrappers of lib/api/route-handler.ts and reads its
 * body through lib/api/request-body.ts. This reads the route files under
 * app/api and fails on a handler that does not.
 */

const apiDir = path.resolve('app/api');

function routeFiles(dir: string): string[] {
  return fs.readdirSync(dir, { withFileTypes: true }).flatMap((e) => {
    const p = path.join(dir, e.name);
    return e.isDirectory() ? routeFiles(p) : e.name === 'route.ts' ? [p] : [];
  });
}

const files = routeFiles(apiDir).map((p) => ({ name: path.relative(apiDir, p), source: fs.readFileSync(p, 'utf8') }));

describe('API route files', () => {
  it('are found', () => {
    expect(files.length).toBeGreaterThan(20);
  });

  it.each(files.map((f) => [f.name, f.source]))(
    '%s: every handler is wrapped and no body is read directly',
    (name, source) => {
      const handlers = [...source.matchAll(/export const (GET|POST|PUT|PATCH|DELETE) = (\w+)(?:<[^(]*>)?\(/g)].map(
        (m) => [m[1], m[2]],
      );
      const unwrapped =
        /export (async )?function (GET|POST|PUT|PATCH|DELETE)\b|export \{[^}]*\bas (GET|POST|PUT|PATCH|DELETE)\b/.test(
          source,
        );
      if (name.startsWith('auth/')) {
        // next-auth checks its own CSRF token; its POST body is size-limited.
        expect(source).toMatch(/export const POST = withBodyLimit\(/);
        return;
      }
      expect(unwrapped).toBe(false);
      expect(handlers.length).toBeGreaterThan(0);
      for (const [method, wrapper] of handlers)
        expect([method, wrapper]).toEqual([method, expect.stringMatching(/^with(out)?Actor$/)]);
      expect(source).not.toMatch(/req\.(json|text|formData|arrayBuffer|blob)\(|req\.body\b/);
    },
  );
});
