import { BadRequestException, UnprocessableEntityException, type HttpException } from '@nestjs/common';
import express, { type RequestHandler } from 'express';
import { scanJsonShape, type JsonShapeLimits, type JsonShapeProblem } from './json-shape';
import { numberBoundMessage, shownNumber } from './number-bounds';

/** Deepest nesting any route takes: the deepest body (an analysis with factor levels) is 4 levels. */
export const JSON_MAX_DEPTH = 32;
/** Most items in one list of an ordinary body. */
export const JSON_MAX_ITEMS = 10_000;

const withSeparators = (count: number) => count.toLocaleString('en-US');

/** The answer to a body outside the limits: 400 for its shape, 422 naming the field for a number. */
export function jsonShapeException(problem: JsonShapeProblem, limits: JsonShapeLimits): HttpException {
  if (problem.kind === 'depth') return new BadRequestException(`The request body nests deeper than ${limits.maxDepth} levels; send flatter JSON.`);
  if (problem.kind === 'items') return new BadRequestException(`A list in the request body has more than ${withSeparators(limits.maxItems)} items; send fewer.`);
  const message = numberBoundMessage(`${problem.field} ${shownNumber(problem.token)}`, problem.problem).replace(/\.$/, '');
  return new UnprocessableEntityException({
    statusCode: 422,
    error: 'Unprocessable Entity',
    message: `Please correct: ${message}.`,
    errors: [{ field: problem.field, message }],
  });
}

/**
 * A JSON body parser that checks the raw body with `scanJsonShape` before parsing it, so depth,
 * list length and numbers are bounded before JSON.parse and validation see them. Every JSON body
 * of the API goes through one of these (see bootstrap.ts).
 * Example: `app.use('/api/stats', boundedJson({ limit: '25mb', maxItems: 200_000 }))`
 */
export function boundedJson(options: { limit: string; maxItems?: number; maxDepth?: number }): RequestHandler {
  const limits: JsonShapeLimits = { maxDepth: options.maxDepth ?? JSON_MAX_DEPTH, maxItems: options.maxItems ?? JSON_MAX_ITEMS };
  return express.json({
    limit: options.limit,
    verify: (_request, _response, bytes) => {
      const problem = scanJsonShape(bytes, limits);
      if (problem) throw jsonShapeException(problem, limits);
    },
  });
}
