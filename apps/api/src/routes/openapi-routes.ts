import { createRequire } from 'node:module';
import path from 'node:path';
import { readFileSync } from 'node:fs';
import express, { Router } from 'express';
import { buildOpenApiDocument } from '../openapi/build-document';

const require = createRequire(import.meta.url);
/** swagger-ui-dist's folder of static files (no build step, nothing fetched from outside). */
const swaggerUiDir = path.dirname(require.resolve('swagger-ui-dist/package.json'));

/** `GET /openapi.json` and a browsable page at `/docs/` (public: the API's shape is no secret). */
export function openApiRoutes(version: string): Router {
  const router = Router();
  const document = buildOpenApiDocument(version);
  router.get('/openapi.json', (_req, res) => {
    res.json(document);
  });
  const page = readFileSync(path.join(swaggerUiDir, 'index.html'), 'utf8').replace('<title>Swagger UI</title>', '<title>Photon Ledger API</title>');
  const initializer = `window.onload = function () {
  window.ui = SwaggerUIBundle({ url: '/api/openapi.json', dom_id: '#swagger-ui', deepLinking: true, withCredentials: true,
    presets: [SwaggerUIBundle.presets.apis, SwaggerUIStandalonePreset], layout: 'StandaloneLayout' });
};\n`;
  // The page's assets are relative links, so it must be read at '/api/docs/' (Express matches both spellings).
  router.get('/docs', (req, res) => {
    if (!req.originalUrl.split('?')[0]!.endsWith('/')) res.redirect(301, '/api/docs/');
    else res.type('html').send(page);
  });
  router.get('/docs/swagger-initializer.js', (_req, res) => res.type('js').send(initializer));
  router.use('/docs', express.static(swaggerUiDir, { index: false, maxAge: '1h' }));
  return router;
}
