import { HttpException, HttpStatus } from '@nestjs/common';

const clock = new Intl.DateTimeFormat('en-GB', { timeStyle: 'medium', timeZone: 'UTC' });

/** 429 during a sign-in lockout: says until when, and carries Retry-After for the answer's header. */
export class TooManyAttemptsException extends HttpException {
  readonly retryAfterSeconds: number;

  constructor(
    readonly lockedUntil: Date,
    scope: 'account' | 'address',
    now = new Date(),
  ) {
    const seconds = Math.max(1, Math.ceil((lockedUntil.getTime() - now.getTime()) / 1000));
    const what = scope === 'account' ? 'this account' : 'your address';
    super(
      {
        statusCode: 429,
        error: 'Too Many Requests',
        message:
          `Too many failed sign-in attempts for ${what}. Sign-in is locked until ${clock.format(lockedUntil)} UTC ` +
          `(in ${seconds} second${seconds === 1 ? '' : 's'}), even with the right password. If you forgot your password, reset it by e-mail.`,
      },
      HttpStatus.TOO_MANY_REQUESTS,
    );
    this.retryAfterSeconds = seconds;
  }
}
