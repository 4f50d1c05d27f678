import type { INestApplication } from '@nestjs/common';
import Ajv, { type ValidateFunction } from 'ajv';
import type { NextFunction, Request, Response } from 'express';
import { createOpenApiDocument } from '../../src/openapi/openapi-document';

interface Operation {
  responses?: Record<string, { content?: Record<string, { schema?: object }> }>;
}
type Document = ReturnType<typeof createOpenApiDocument>;

/** Every answer the end-to-end tests received that its route's documented schema does not describe. */
export const contractViolations: string[] = [];

/** OpenAPI 3.0's `nullable: true` as plain JSON Schema (`anyOf` the schema or null), which Ajv reads everywhere. */
function withNullsAsJsonSchema(node: unknown): unknown {
  if (Array.isArray(node)) return node.map(withNullsAsJsonSchema);
  if (typeof node !== 'object' || node === null) return node;
  const { nullable, ...rest } = node as Record<string, unknown>;
  const converted = Object.fromEntries(Object.entries(rest).map(([key, value]) => [key, withNullsAsJsonSchema(value)]));
  return nullable === true ? { anyOf: [converted, { type: 'null' }] } : converted;
}

const pointer = (...parts: string[]) => parts.map((part) => encodeURIComponent(part.replace(/~/g, '~0').replace(/\//g, '~1'))).join('/');

/**
 * Checks each JSON answer against the OpenAPI document the web app's client is generated from, so
 * a DTO that drifts from what a service really returns fails the suite that exercised it.
 */
class ResponseContract {
  private readonly ajv = new Ajv({ strict: false, allErrors: false, validateFormats: false });
  private readonly routes: Array<{ pattern: RegExp; literalSegments: number; template: string; operations: Record<string, Operation> }>;
  private readonly validators = new Map<string, ValidateFunction>();

  constructor(private readonly document: Document) {
    this.ajv.addSchema(withNullsAsJsonSchema(document) as object, 'openapi');
    this.routes = Object.entries(document.paths).map(([template, operations]) => ({
      template,
      operations: operations as Record<string, Operation>,
      pattern: new RegExp(`^${template.replace(/[.]/g, '\\.').replace(/\{[^}]+\}/g, '[^/]+')}$`),
      literalSegments: template.split('/').filter((segment) => segment && !segment.startsWith('{')).length,
    }));
  }

  check(method: string, url: string, status: number, body: unknown): string | null {
    const path = url.split('?')[0];
    const route = this.routes.filter((r) => r.pattern.test(path)).sort((a, b) => b.literalSegments - a.literalSegments)[0];
    const operation = route?.operations[method.toLowerCase()];
    if (!route || !operation) return null;
    const response = operation.responses?.[String(status)];
    if (!response) return status < 300 ? `${method} ${route.template} answered ${status}, which its documentation does not list` : null;
    if (!response.content?.['application/json']?.schema) return null;
    const key = `${method.toLowerCase()} ${route.template} ${status}`;
    let validate = this.validators.get(key);
    if (!validate) {
      const ref = `openapi#/${pointer('paths', route.template, method.toLowerCase(), 'responses', String(status), 'content', 'application/json', 'schema')}`;
      try {
        validate = this.ajv.compile({ $ref: ref });
      } catch (error) {
        return `${key}: the documented schema cannot be read (${error instanceof Error ? error.message : String(error)})`;
      }
      this.validators.set(key, validate);
    }
    if (validate(JSON.parse(JSON.stringify(body)))) return null;
    const problems = (validate.errors ?? []).map((e) => `${e.instancePath || '(body)'} ${e.message}`).join('; ');
    return `${method} ${route.template} ${status}: ${problems}`;
  }
}

/** Wraps res.json so every JSON answer is checked against its documented schema (test app only). */
export function checkResponsesAgainstOpenApi(app: INestApplication): void {
  const contract = new ResponseContract(createOpenApiDocument(app));
  app.use((request: Request, response: Response, next: NextFunction) => {
    const record = (body: unknown) => {
      const violation = contract.check(request.method, request.originalUrl, response.statusCode, body);
      if (violation && !contractViolations.includes(violation)) contractViolations.push(violation);
    };
    const json = response.json.bind(response);
    const send = response.send.bind(response);
    let inJson = false;
    response.json = (body: unknown) => {
      record(body);
      inJson = true;
      try {
        return json(body);
      } finally {
        inJson = false;
      }
    };
    // JSON text sent as it is (the Findings cache keeps its answers written out) is checked as well.
    response.send = (body?: unknown) => {
      const type = String(response.getHeader('content-type') ?? '');
      if (!inJson && type.startsWith('application/json') && (typeof body === 'string' || Buffer.isBuffer(body))) record(JSON.parse(body.toString()));
      return send(body);
    };
    next();
  });
}
