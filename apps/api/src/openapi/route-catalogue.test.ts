import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startApi, type ApiHarness } from '../../test/api-harness';
import { routeCatalogue } from './route-catalogue';
import { openApiPath } from './build-document';

const routesDir = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../routes');

/** `router.get('/path', ...)` calls in the route files (the routes Express really serves). */
function routesInSource(): string[] {
  const found: string[] = [];
  for (const file of readdirSync(routesDir).filter((f) => f.endsWith('.ts') && !f.endsWith('.test.ts'))) {
    if (file === 'openapi-routes.ts') continue; // the document and its page describe the others
    const text = readFileSync(path.join(routesDir, file), 'utf8');
    // Paths are literals, or templates on one `const base = '...'` of the file.
    const base = /const base = '([^']+)'/.exec(text)?.[1] ?? '';
    for (const m of text.matchAll(/router\.(get|post|put|patch|delete)\(\s*['`]([^'`]+)['`]/g)) {
      found.push(`${m[1]} ${m[2]!.replace('${base}', base)}`);
    }
  }
  return found.sort();
}

describe('route catalogue', () => {
  it('lists exactly the routes the route files serve', () => {
    const documented = routeCatalogue.map((r) => `${r.method} ${r.path}`).sort();
    expect(documented).toEqual(routesInSource());
  });

  it('has no route twice', () => {
    const keys = routeCatalogue.map((r) => `${r.method} ${r.path}`);
    expect(new Set(keys).size).toBe(keys.length);
  });
});

describe('GET /api/openapi.json and /api/docs/', () => {
  let api: ApiHarness;
  beforeAll(async () => {
    api = await startApi();
  });
  afterAll(async () => {
    await api.close();
  });

  it('serves an OpenAPI 3.1 document with every catalogued operation, its schemas and error answers', async () => {
    const agent = await api.signedIn('engineer');
    const res = await agent.get('/api/openapi.json');
    expect(res.status).toBe(200);
    const doc = res.body as { openapi: string; paths: Record<string, Record<string, { responses: Record<string, unknown>; requestBody?: unknown }>> };
    expect(doc.openapi).toBe('3.1.0');
    for (const route of routeCatalogue) {
      const op = doc.paths[openApiPath(route.path)]?.[route.method];
      expect(op, `${route.method} ${route.path}`).toBeDefined();
      expect(Object.keys(op!.responses)).toContain(String(route.response.status));
      if (route.body || route.multipart) expect(op!.requestBody, `${route.method} ${route.path} body`).toBeDefined();
    }
    // A body schema carries the shared schema's constraints, e.g. the sign-in e-mail format.
    const login = doc.paths['/api/auth/login']!.post!.requestBody as { content: Record<string, { schema: { properties: Record<string, unknown> } }> };
    expect(login.content['application/json']!.schema.properties).toHaveProperty('email');
  });

  it('serves the browsable page and its scripts from the installed package, pointed at the document', async () => {
    const agent = await api.signedIn('engineer');
    const page = await agent.get('/api/docs/');
    expect(page.status).toBe(200);
    expect(page.text).toContain('Photon Ledger API');
    const init = await agent.get('/api/docs/swagger-initializer.js');
    expect(init.text).toContain('/api/openapi.json');
    const bundle = await agent.get('/api/docs/swagger-ui-bundle.js');
    expect(bundle.status).toBe(200);
    expect(bundle.text.length).toBeGreaterThan(100_000);
  });
});
