/**
 * The OpenAPI 3.1 document, generated from the route catalogue and the shared zod schemas
 * (zod's own JSON Schema output, draft 2020-12, which OpenAPI 3.1 uses).
 */
import { z } from 'zod';
import { apiErrorSchema, EXPORT_CAUTION_TEXT } from './document-constants';
import { routeCatalogue, type RouteAccess, type RouteDoc } from './route-catalogue';

type JsonSchema = Record<string, unknown>;

const jsonSchema = (schema: z.ZodType, io: 'input' | 'output'): JsonSchema => {
  const { $schema: _drop, ...rest } = z.toJSONSchema(schema, { io, unrepresentable: 'any' }) as JsonSchema;
  return rest;
};

const accessText: Record<RouteAccess, string> = {
  public: 'No sign-in needed.',
  'signed-in': 'Any signed-in user.',
  admin: 'Administrators only.',
  'admin-or-lead': 'Administrators and leads.',
  read: 'Members of the mission (administrators see every mission); others get 404.',
  comment: 'Members of the mission with the role engineer, lead or reviewer; non-members get 404.',
  edit: 'Members of the mission with the role engineer or lead (reviewers and administrators get 403); non-members get 404.',
  lead: 'Members of the mission with the role lead (others get 403); non-members get 404.',
};

/** `/missions/:missionId` → `/missions/{missionId}`. */
export const openApiPath = (expressPath: string) => `/api${expressPath.replace(/:(\w+)/g, '{$1}')}`;

function parameters(route: RouteDoc): JsonSchema[] {
  const list: JsonSchema[] = [];
  for (const [where, schema] of [['path', route.params], ['query', route.query]] as const) {
    if (!schema) continue;
    const js = jsonSchema(schema, 'input') as { properties?: Record<string, JsonSchema>; required?: string[] };
    for (const [name, prop] of Object.entries(js.properties ?? {})) {
      list.push({ name, in: where, required: where === 'path' || (js.required ?? []).includes(name), schema: prop });
    }
  }
  return list;
}

function operation(route: RouteDoc): JsonSchema {
  const errorContent = { 'application/json': { schema: jsonSchema(apiErrorSchema, 'output') } };
  const responses: Record<string, JsonSchema> = {};
  const { status, schema, contentType } = route.response;
  if (contentType) {
    responses[String(status)] = {
      description: `A file (${contentType}), streamed. ${EXPORT_CAUTION_TEXT}`,
      content: { [contentType]: { schema: { type: 'string' } } },
    };
  } else if (schema) {
    responses[String(status)] = { description: 'Success', content: { 'application/json': { schema: jsonSchema(schema, 'output') } } };
  } else {
    responses[String(status)] = { description: 'Success, no content' };
  }
  if (route.params || route.query || route.body || route.multipart) {
    responses['400'] = { description: 'Invalid input: `error.fields` names each offending field', content: errorContent };
  }
  if (route.access !== 'public') {
    responses['401'] = { description: 'Not signed in', content: errorContent };
    if (route.access !== 'signed-in' && route.access !== 'read') responses['403'] = { description: 'Role not allowed', content: errorContent };
  }
  if (route.path.includes(':')) responses['404'] = { description: 'Unknown, or not visible to the caller', content: errorContent };

  const op: JsonSchema = {
    operationId: `${route.method}${route.path.replace(/[/:-](\w)/g, (_m, c: string) => c.toUpperCase()).replace(/\W/g, '')}`,
    summary: route.summary,
    description: accessText[route.access],
    tags: [route.tag],
    parameters: parameters(route),
    responses,
  };
  if (route.access !== 'public') op.security = [{ sessionCookie: [] }];
  if (route.body) op.requestBody = { required: true, content: { 'application/json': { schema: jsonSchema(route.body, 'input') } } };
  if (route.multipart) {
    const fields = jsonSchema(route.multipart, 'input') as { properties?: Record<string, JsonSchema>; required?: string[] };
    op.requestBody = {
      required: true,
      content: {
        'multipart/form-data': {
          schema: {
            type: 'object',
            properties: { file: { type: 'string', format: 'binary' }, ...(fields.properties ?? {}) },
            required: ['file', ...(fields.required ?? [])],
          },
        },
      },
    };
  }
  return op;
}

/** Builds the document (cheap enough to build once at start-up). */
export function buildOpenApiDocument(version: string): JsonSchema {
  const paths: Record<string, Record<string, JsonSchema>> = {};
  for (const route of routeCatalogue) {
    const p = openApiPath(route.path);
    paths[p] ??= {};
    paths[p][route.method] = operation(route);
  }
  return {
    openapi: '3.1.0',
    info: {
      title: 'Photon Ledger API',
      version,
      description:
        'Solar radiation pressure budgets for spacecraft and solar sails: vehicles, scenarios, runs on a job queue, results, budgets and exports. ' +
        'Sign in with POST /api/auth/login; the session travels in an httpOnly cookie. Errors have one shape: { error: { code, message, fields? } }. ' +
        EXPORT_CAUTION_TEXT,
    },
    servers: [{ url: '/' }],
    components: { securitySchemes: { sessionCookie: { type: 'apiKey', in: 'cookie', name: 'pl_session' } } },
    paths,
  };
}
