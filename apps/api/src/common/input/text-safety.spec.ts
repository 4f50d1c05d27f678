import { describe, expect, it } from 'vitest';
import { findTextProblems, textProblem } from './text-safety';

describe('textProblem and findTextProblems', () => {
  it('refuses NUL and unpaired surrogates, keeps whole characters', () => {
    expect(textProblem('clay\u0000')).toBe('nul');
    expect(textProblem('half \ud83e pair')).toBe('unpaired-surrogate');
    expect(textProblem('\udfffstart')).toBe('unpaired-surrogate');
    expect(textProblem('worms 🪱, Ñandú, 土')).toBeNull();
  });

  it('names each field by its path, keys included', () => {
    expect(findTextProblems({ title: 'ok', observations: [{ site: 'a' }, { site: 'b\u0000' }], ['k\ud800']: 1 })).toEqual([
      { field: 'k\ud800', message: 'the name of field "k\\ud800" must not hold half of a character pair (an unpaired surrogate)' },
      { field: 'observations[1].site', message: 'observations[1].site must not hold a NUL character (\\u0000)' },
    ]);
    expect(findTextProblems('x\u0000')).toEqual([{ field: 'value', message: 'value must not hold a NUL character (\\u0000)' }]);
  });
});
