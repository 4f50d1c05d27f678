import { describe, expect, it } from 'vitest';
import { scanJsonShape } from './json-shape';

const limits = { maxDepth: 32, maxItems: 10_000 };
const scan = (text: string) => scanJsonShape(Buffer.from(text, 'utf8'), limits);

describe('scanJsonShape: depth, list length and numbers on the raw bytes', () => {
  it('passes ordinary bodies', () => {
    expect(scan('{"design":"rcbd","observations":[{"treatment":"A","value":12.5},{"value":"1e300"}],"alpha":0.05}')).toBeNull();
    expect(scan('{"a":"[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[","b":"\\"{{{{"}')).toBeNull(); // brackets inside strings do not count
  });

  it('refuses nesting beyond the limit, iteratively (5000 levels)', () => {
    expect(scan(`{"x":${'['.repeat(5000)}${']'.repeat(5000)}}`)).toEqual({ kind: 'depth' });
    expect(scan(`${'['.repeat(32)}${']'.repeat(32)}`)).toBeNull();
    expect(scan(`${'['.repeat(33)}${']'.repeat(33)}`)).toEqual({ kind: 'depth' });
  });

  it('refuses a list longer than the limit, counting every kind of item', () => {
    expect(scan(`[${new Array(10_000).fill('"a"').join(',')}]`)).toBeNull();
    expect(scan(`[${new Array(10_001).fill('{}').join(',')}]`)).toEqual({ kind: 'items' });
    expect(scan(`{"l":[${new Array(10_001).fill('null').join(',')}]}`)).toEqual({ kind: 'items' });
  });

  it('names the field of a number token out of bounds', () => {
    expect(scan('{"version":1,"value":1e300000000}')).toEqual({ kind: 'number', field: 'value', token: '1e300000000', problem: 'too-large' });
    expect(scan('{"observations":[{"value":1},{"treatment":"B","value":-1e-400}]}')).toEqual({
      kind: 'number',
      field: 'observations[1].value',
      token: '-1e-400',
      problem: 'too-small',
    });
    expect(scan('{"we\\"ird":[1,2,123456789012345678901234567890123]}')).toMatchObject({ field: 'we"ird[2]', problem: 'too-large' });
    expect(scan('[1e99]')).toMatchObject({ field: '[0]' });
  });

  it('never throws on malformed JSON (JSON.parse refuses it next)', () => {
    for (const text of ['{"a":1,', ':::', ']]]', '"unterminated', '{"a" 1e999999}', '', 'tru']) expect(() => scan(text)).not.toThrow();
  });
});
