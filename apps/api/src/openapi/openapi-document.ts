import type { INestApplication } from '@nestjs/common';
import { DocumentBuilder, getSchemaPath, SwaggerModule, type OpenAPIObject } from '@nestjs/swagger';
import { ProblemDetailDto, ProblemDto } from '../common/dto/problem.dto';

/**
 * The OpenAPI document of every route (served at /api/docs and turned into the web app's typed client).
 * Every refusal carries the same body (ProblemFilter), so each documented error answer without a schema
 * of its own gets ProblemDto here rather than on every route.
 */
export function createOpenApiDocument(app: INestApplication): OpenAPIObject {
  const document = SwaggerModule.createDocument(
    app,
    new DocumentBuilder()
      .setTitle('Friable API')
      .setDescription('Replicated garden-treatment trials: protocol, sites, plots, observations and findings.')
      .setVersion('0.1.0')
      .addBearerAuth()
      .build(),
    { extraModels: [ProblemDto, ProblemDetailDto] },
  );
  for (const path of Object.values(document.paths)) {
    for (const operation of [path.get, path.put, path.post, path.delete, path.patch, path.head]) {
      for (const [status, response] of Object.entries(operation?.responses ?? {})) {
        if (!response) continue;
        if (Number(status) >= 400 && !('$ref' in response) && !response.content) {
          response.content = { 'application/json': { schema: { $ref: getSchemaPath(ProblemDto) } } };
        }
      }
    }
  }
  return document;
}
