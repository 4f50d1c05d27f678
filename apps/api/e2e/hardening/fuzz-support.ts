import fc from 'fast-check';
import type { OpenAPIObject } from '@nestjs/swagger';
import { QueryTypes } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';

/** One route of the OpenAPI document, as the fuzz test drives it. */
export interface FuzzRoute {
  readonly method: 'get' | 'post' | 'put' | 'patch' | 'delete';
  /** The path with `{name}` placeholders, as the document writes it. */
  readonly path: string;
  readonly pathParams: readonly string[];
  readonly queryParams: readonly string[];
  readonly body: 'json' | 'multipart' | null;
  /** Property names of the JSON body's schema (empty when unknown). */
  readonly bodyFields: readonly string[];
  /** `METHOD /path`, for messages. */
  readonly label: string;
}

type Operation = {
  parameters?: Array<{ name: string; in: string } | { $ref: string }>;
  requestBody?: { content?: Record<string, { schema?: { $ref?: string; properties?: Record<string, unknown> } }> };
};

/** Every route of the document: methods, path and query parameters, and what the body is. */
export function routesOf(document: OpenAPIObject): FuzzRoute[] {
  const routes: FuzzRoute[] = [];
  const schemas = (document.components?.schemas ?? {}) as Record<string, { properties?: Record<string, unknown> }>;
  for (const [path, item] of Object.entries(document.paths)) {
    for (const method of ['get', 'post', 'put', 'patch', 'delete'] as const) {
      const operation = (item as Record<string, Operation | undefined>)[method];
      if (!operation) continue;
      const parameters = (operation.parameters ?? []).filter((p): p is { name: string; in: string } => 'name' in p);
      const content = operation.requestBody?.content ?? {};
      const json = content['application/json'];
      const body = json ? 'json' : content['multipart/form-data'] ? 'multipart' : null;
      const ref = json?.schema?.$ref?.replace('#/components/schemas/', '');
      const properties = (ref ? schemas[ref]?.properties : json?.schema?.properties) ?? {};
      routes.push({
        method,
        path,
        // From the template: not every path parameter is declared (the trial access decorator reads trialId itself).
        pathParams: [...path.matchAll(/\{(\w+)\}/g)].map((match) => match[1]!),
        queryParams: parameters.filter((p) => p.in === 'query').map((p) => p.name),
        body,
        bodyFields: Object.keys(properties),
        label: `${method.toUpperCase()} ${path}`,
      });
    }
  }
  return routes;
}

/** Texts no field may keep, or numbers no field may take: each is refused wherever it appears. */
export const poisonText = fc.constantFrom('a\u0000b', '\u0000', 'half \ud800 pair', '\udfff', 'x\u0000'.repeat(3));
const hugeNumberText = fc.constantFrom('1e300000000', '-1e300000000', '1e-300000000', '9'.repeat(400), '0.' + '0'.repeat(300) + '1', '12.5E+999999999999');

/** Odd but harmless-looking scalars: each may be valid for one field and wrong for another. */
const oddScalar = fc.oneof(
  fc.constantFrom('', ' ', 'NaN', 'Infinity', '-0', 'null', 'true', '=1+1', '<script>alert(1)</script>', "'; DROP TABLE trials; --", '__proto__', 'NA', '>600', '1e21', '١٢٣'),
  hugeNumberText,
  fc.string({ maxLength: 40 }),
  fc.string({ unit: 'binary', maxLength: 20 }),
  fc.integer(),
  fc.constantFrom(0, -1, 1e19, -1e19, 1e15, 2 ** 53, 2 ** 31, -(2 ** 31), 0.1, 1e-29, 3.5),
  fc.double({ noNaN: true, noDefaultInfinity: true }),
  fc.boolean(),
  fc.constant(null),
);
/** The same, and a text longer than any field takes (not for query strings: servers cap their length). */
const oddBodyScalar = fc.oneof(oddScalar, fc.constant('x'.repeat(70_000)));

/** Any JSON-like value, with odd scalars at the leaves. */
export const oddValue: fc.Arbitrary<unknown> = fc.letrec<{ value: unknown }>((tie) => ({
  value: fc.oneof(
    { depthSize: 'small', withCrossShrink: true },
    oddBodyScalar,
    fc.array(tie('value'), { maxLength: 4 }),
    fc.dictionary(fc.oneof(fc.string({ maxLength: 10 }), fc.constantFrom('__proto__', 'constructor', 'prototype')), tie('value'), { maxKeys: 4 }),
  ),
})).value;

/** A JSON body, and whether it is poisoned: then no route may accept it. */
export type FuzzBody = { readonly raw: string; readonly poisoned: boolean } | { readonly value: unknown; readonly poisoned: boolean };

/** Raw JSON texts every route must refuse: too deep, too long a list, a number out of bounds, a NUL, not JSON. */
const poisonJsonText = fc.constantFrom(
  `{"x":${'['.repeat(5000)}${']'.repeat(5000)}}`,
  `${'{"a":'.repeat(3000)}1${'}'.repeat(3000)}`,
  `{"list":[${new Array(10_001).fill('0').join(',')}]}`,
  '{"value":1e300000000}',
  '{"value":-1e-300000000,"version":1}',
  `{"n":${'9'.repeat(5000)}}`,
  '{"a":1,',
  'not json',
  '{"title":"\\u0000"}',
  '{"title":"\\ud800"}',
  '{"__proto__":{"isAdmin":true},"unknownField":"\\u0000"}',
);
/** Odd but not necessarily wrong raw texts. */
const oddJsonText = fc.constantFrom('"just text"', '[]', 'null', '{}', '\ufeff{"a":1}', '{"__proto__":{"isAdmin":true}}');

/**
 * A JSON body for a route with these fields: a poisoned one (some fields set to odd values and at
 * least one to a poison: a NUL, half a surrogate pair, a number out of bounds, a shape out of
 * bounds), or an odd one that may well be valid (known fields set to odd scalars).
 */
export function jsonBody(fields: readonly string[]): fc.Arbitrary<FuzzBody> {
  const fieldNames = fields.length > 0 ? fc.constantFrom(...fields) : fc.string({ minLength: 1, maxLength: 12 });
  // A NUL or half a surrogate pair anywhere, or a field no DTO knows: refused wherever it is.
  const poisonedObject = fc
    .tuple(fc.dictionary(fieldNames, oddValue, { maxKeys: 6 }), fc.oneof(fieldNames, fc.constant('unknownField')), poisonText)
    .map(([object, field, poison]) => ({ value: { ...object, [field]: poison } as unknown, poisoned: true }));
  const unknownField = fc
    .tuple(fc.dictionary(fieldNames, oddValue, { maxKeys: 4 }), oddValue)
    .map(([object, odd]) => ({ value: { ...object, unknownField: odd } as unknown, poisoned: fields.length > 0 }));
  const hugeNumberInField = fc
    .tuple(fc.dictionary(fieldNames, oddValue, { maxKeys: 4 }), fieldNames, hugeNumberText)
    .map(([object, field, text]) => ({ value: { ...object, [field]: text } as unknown, poisoned: false }));
  const poisonedNumberToken = fc
    .tuple(fc.dictionary(fieldNames, oddValue, { maxKeys: 4 }), fieldNames, fc.constantFrom('1e300000000', '-1e300000000', '1e-400', '123456789012345678901234567890123'))
    .map(([object, field, token]) => {
      const rest = JSON.stringify({ ...object, [field]: undefined });
      return { raw: `{${JSON.stringify(field)}:${token}${rest === '{}' ? '' : `,${rest.slice(1, -1)}`}}`, poisoned: true };
    });
  const knownFieldsOnly = fc.dictionary(fieldNames, oddBodyScalar, { maxKeys: 6 }).map((value) => ({ value: value as unknown, poisoned: false }));
  return fc.oneof(
    { weight: 3, arbitrary: poisonedObject },
    { weight: 1, arbitrary: unknownField },
    { weight: 2, arbitrary: hugeNumberInField },
    { weight: 2, arbitrary: poisonedNumberToken },
    { weight: 2, arbitrary: poisonJsonText.map((raw) => ({ raw, poisoned: true })) },
    { weight: 4, arbitrary: knownFieldsOnly },
    { weight: 1, arbitrary: oddJsonText.map((raw) => ({ raw, poisoned: false })) },
    { weight: 1, arbitrary: oddValue.map((value) => ({ value, poisoned: false })) },
  );
}

/** Whether a path value could name a real record: the API reads ids leniently (" 1", "+1", "0x1" and "1e0" are all 1). */
function couldBeAnId(encoded: string): boolean {
  let text: string;
  try {
    text = decodeURIComponent(encoded);
  } catch {
    return false;
  }
  const value = Number(text);
  return text.trim() !== '' && Number.isInteger(value) && value >= 1 && value < 2 ** 31;
}

/** Path parameter values that are not ids of anything: none may reach a handler as a real record (someone else's, from another suite). */
export const hostilePathValue = fc
  .oneof(
    fc.constantFrom('0', '-1', 'abc', '1e300000000', '99999999999999999999999', '1.5', '%00', '%E0%A4%A', '%ZZ', '%F0%9F%AA%B1', "1'%20OR%20'1'='1", '%2e%2e%2f', '9007199254740993', '2147483648'),
    fc.string({ minLength: 1, maxLength: 30 }).map((text) => encodeURIComponent(text)),
  )
  .filter((value) => !couldBeAnId(value));

/** Query parameter values. */
export const hostileQueryValue = fc.oneof(oddScalar.map((value) => (typeof value === 'string' ? value : JSON.stringify(value))), poisonText, hugeNumberText);

/** Bytes of an uploaded file: random bytes, or CSV text with a poisoned cell. */
export const hostileFile = fc.oneof(
  fc.uint8Array({ maxLength: 2048 }).map((bytes) => Buffer.from(bytes)),
  fc
    .tuple(fc.constantFrom('plot label,drain time (s)', 'plot label,crumble score,notes', '\ufeffplot label;drain time (s)'), fc.oneof(hugeNumberText, poisonText, fc.constantFrom('=1+1', '\u0000', 'x'.repeat(20_000))))
    .map(([header, cell]) => Buffer.from(`${header}\nTG-B1-P01,${cell}\nTG-B1-P02,${cell},${cell}\n`, 'utf8')),
);

/** Rows InnoDB has inserted, updated or deleted since the server started: a cheap sign that something was written. */
export async function rowWrites(sequelize: Sequelize): Promise<number> {
  const rows = await sequelize.query<{ n: string | number }>(
    "SELECT SUM(variable_value) AS n FROM information_schema.global_status WHERE variable_name IN ('INNODB_ROWS_INSERTED', 'INNODB_ROWS_UPDATED', 'INNODB_ROWS_DELETED')",
    { type: QueryTypes.SELECT },
  );
  return Number(rows[0]!.n);
}

/**
 * A fingerprint of the database's contents: CHECKSUM TABLE of every table except the bookkeeping
 * of sign-in attempts (counting a refused sign-in is what those tables are for).
 */
export async function databaseFingerprint(sequelize: Sequelize): Promise<string> {
  const tables = await sequelize.query<{ name: string }>(
    'SELECT table_name AS name FROM information_schema.tables WHERE table_schema = DATABASE() AND table_type = ? ORDER BY table_name',
    { replacements: ['BASE TABLE'], type: QueryTypes.SELECT },
  );
  const kept = tables.map((t) => t.name).filter((name) => !/login|sign_?in|attempt|lockout|session|throttl/i.test(name));
  const sums = await sequelize.query<{ Table: string; Checksum: string | number | null }>(`CHECKSUM TABLE ${kept.map((name) => `\`${name}\``).join(', ')}`, {
    type: QueryTypes.SELECT,
  });
  return sums.map((row) => `${row.Table}=${row.Checksum}`).join(';');
}
