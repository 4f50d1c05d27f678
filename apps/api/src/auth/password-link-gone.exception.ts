import { GoneException } from '@nestjs/common';

/** 410: the password-reset link was real but is used, expired, or its account deactivated. */
export class PasswordLinkGoneException extends GoneException {}
