import { describe, expect, it } from 'vitest';
import { ApiError, formBody, problemOf } from './api-client';

describe('the API client helpers', () => {
  it('sends an upload as a form with the file under its own name', () => {
    const { bodySerializer } = formBody({ file: new File(['second'], 'b.jpg', { type: 'image/jpeg' }), note: 'x' });
    const form = bodySerializer();
    expect((form.get('file') as File).name).toBe('b.jpg');
    expect(form.get('note')).toBe('x');
  });

  it('turns a refusal into an ApiError with the server’s sentence and its field details, or the status line', () => {
    const error = problemOf({ status: 422, statusText: 'Unprocessable Entity' }, { message: 'Please correct: code.', errors: [{ field: 'code', message: 'code must be 1 to 12 letters' }] });
    expect(error).toBeInstanceOf(ApiError);
    expect(error).toMatchObject({ status: 422, message: 'Please correct: code.', details: [{ field: 'code', message: 'code must be 1 to 12 letters' }] });
    expect(problemOf({ status: 502, statusText: 'Bad Gateway' }, '<html>proxy</html>').message).toBe('The server answered 502 Bad Gateway');
  });
});
