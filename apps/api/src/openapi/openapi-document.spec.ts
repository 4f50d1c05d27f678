import { describe, expect, it } from 'vitest';
import { readOpenApiDocument } from './print-openapi';

type Responses = Record<string, { content?: Record<string, { schema?: unknown }> }>;

describe('the OpenAPI document', async () => {
  const document = JSON.parse(await readOpenApiDocument()) as {
    paths: Record<string, Record<string, { responses: Responses }>>;
    components: { schemas: Record<string, unknown> };
  };
  const operations = Object.entries(document.paths).flatMap(([path, methods]) =>
    Object.entries(methods).map(([method, operation]) => ({ route: `${method.toUpperCase()} ${path}`, responses: operation.responses })),
  );

  it('lists the routes of every feature', () => {
    expect(operations.length).toBeGreaterThan(60);
    expect(operations.map((o) => o.route)).toEqual(expect.arrayContaining(['GET /api/trials/{trialId}', 'POST /api/stats/anova', 'GET /api/trials/{trialId}/findings']));
  });

  it('gives every route a success answer with its schema (or 204 with no body)', () => {
    const undocumented = operations.filter(({ responses }) => {
      const successes = Object.entries(responses).filter(([status]) => status.startsWith('2'));
      return successes.length === 0 || successes.some(([status, response]) => status !== '204' && !Object.values(response.content ?? {}).some((media) => media.schema));
    });
    expect(undocumented.map((o) => o.route)).toEqual([]);
  });

  it('gives every documented refusal a body schema (the problem body unless the route has its own)', () => {
    const bare = operations.flatMap(({ route, responses }) =>
      Object.entries(responses)
        .filter(([status, response]) => Number(status) >= 400 && !response.content)
        .map(([status]) => `${route} ${status}`),
    );
    expect(bare).toEqual([]);
    expect(document.components.schemas).toHaveProperty('ProblemDto');
  });

  it('names no property with an untyped object (a nullable union needs an explicit type)', () => {
    const untyped = Object.entries(document.components.schemas as Record<string, { properties?: Record<string, Record<string, unknown>> }>).flatMap(([name, schema]) =>
      Object.entries(schema.properties ?? {})
        .filter(([, property]) => property.type === 'object' && !property.properties && !property.additionalProperties && !property.allOf)
        .map(([key]) => `${name}.${key}`),
    );
    expect(untyped).toEqual([]);
  });
});
