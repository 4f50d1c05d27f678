import {
  BadRequestException,
  Inject,
  Injectable,
  PayloadTooLargeException,
  UnprocessableEntityException,
  mixin,
  type CallHandler,
  type ExecutionContext,
  type NestInterceptor,
  type Type,
} from '@nestjs/common';
import type { Request, Response } from 'express';
import multer, { MulterError } from 'multer';
import { rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { finalize, type Observable } from 'rxjs';

export interface SingleFileUploadOptions {
  /** The multipart form field that carries the file, e.g. `file`. */
  field: string;
  /** Injection token of a config object with `maxBytes` (the largest file accepted). */
  configToken: string | symbol;
  /** What the file is, for messages: "a CSV file", "a photo". */
  what: string;
  /**
   * 'memory' (the default) hands the route `file.buffer`; 'disk' streams the upload into the
   * config's `workDir` (else the system's temporary folder), hands the route `file.path`, and removes
   * the file once the route has answered — for uploads too large to hold in memory.
   */
  storage?: 'memory' | 'disk';
}

export function formatMegabytes(bytes: number): string {
  return `${new Intl.NumberFormat('en', { maximumFractionDigits: 1 }).format(bytes / 1_048_576)} MB`;
}

function refusal(error: unknown, options: SingleFileUploadOptions, maxBytes: number): Error {
  if (error instanceof MulterError) {
    if (error.code === 'LIMIT_FILE_SIZE') {
      return new PayloadTooLargeException(`The file is larger than ${formatMegabytes(maxBytes)}, the most accepted for ${options.what}. Split it or make it smaller.`);
    }
    if (error.code === 'LIMIT_UNEXPECTED_FILE' || error.code === 'LIMIT_FILE_COUNT') {
      return new UnprocessableEntityException(`Send one file, as ${options.what}, in the form field "${options.field}".`);
    }
    return new BadRequestException(`The upload could not be read (${error.message}); send it as multipart/form-data with the file in "${options.field}".`);
  }
  return new BadRequestException(`The upload could not be read; send it as multipart/form-data with the file in "${options.field}".`);
}

/**
 * Single file upload — an interceptor that reads one multipart file into memory (or onto disk),
 * refusing a file over the configured size with 413 and a sentence (multer's LIMIT_FILE_SIZE),
 * before the route runs.
 *
 * Purpose: Intake and photos both take one file; the size limit comes from their own config.
 * Reference: multer's limits (https://github.com/expressjs/multer#limits).
 * Throws (as HTTP answers): 413 over the limit, 422 for a file in another field or several files, 400 for a broken body.
 * Example: `@UseInterceptors(SingleFileUpload({ field: 'file', configToken: intakeConfig.KEY, what: 'a CSV file' }))`
 */
export function SingleFileUpload(options: SingleFileUploadOptions): Type<NestInterceptor> {
  @Injectable()
  class SingleFileUploadInterceptor implements NestInterceptor {
    constructor(@Inject(options.configToken) private readonly config: { maxBytes: number; workDir?: string }) {}

    async intercept(context: ExecutionContext, next: CallHandler): Promise<Observable<unknown>> {
      const http = context.switchToHttp();
      const request = http.getRequest<Request>();
      const maxBytes = this.config.maxBytes;
      const storage = options.storage === 'disk' ? multer.diskStorage({ destination: this.config.workDir ?? tmpdir() }) : multer.memoryStorage();
      const upload = multer({ storage, limits: { fileSize: maxBytes, files: 1, fields: 20 } }).single(options.field);
      await new Promise<void>((resolve, reject) => {
        upload(request, http.getResponse<Response>(), (error: unknown) => (error ? reject(refusal(error, options, maxBytes)) : resolve()));
      });
      const path = request.file?.path;
      if (!path) return next.handle();
      // The route has read the file by the time its answer goes out; a file left behind would fill the disk.
      return next.handle().pipe(finalize(() => void rm(path, { force: true })));
    }
  }
  return mixin(SingleFileUploadInterceptor);
}
