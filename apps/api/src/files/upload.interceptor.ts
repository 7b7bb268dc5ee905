import {
  BadRequestException,
  CallHandler,
  ExecutionContext,
  Injectable,
  mixin,
  NestInterceptor,
  PayloadTooLargeException,
  Type,
} from '@nestjs/common';
import type { Request, Response } from 'express';
import multer from 'multer';
import { Observable } from 'rxjs';

export const MB = 1024 * 1024;

/**
 * Reads one multipart file (field `field`, at most `maxBytes`) into memory as `req.file`, with
 * messages a person can act on: 413 for a file over the limit, 400 for anything else wrong with
 * the form. A request that is not multipart passes through with no file; the handler says so.
 */
export function UploadInterceptor(field: string, maxBytes: number, what: string): Type<NestInterceptor> {
  const upload = multer({ storage: multer.memoryStorage(), limits: { fileSize: maxBytes, files: 1, fields: 10, parts: 11 } }).single(field);

  @Injectable()
  class Interceptor implements NestInterceptor {
    async intercept(context: ExecutionContext, next: CallHandler): Promise<Observable<unknown>> {
      const http = context.switchToHttp();
      const req = http.getRequest<Request>();
      const res = http.getResponse<Response>();
      await new Promise<void>((resolve, reject) => {
        upload(req, res, (err: unknown) => {
          if (!err) {
            resolve();
          } else if (err instanceof multer.MulterError) {
            reject(
              err.code === 'LIMIT_FILE_SIZE'
                ? new PayloadTooLargeException({
                    message: `${what} is larger than ${maxBytes / MB} MB: scan it at a lower resolution or save it as a smaller PDF`,
                    code: 'too_large',
                  })
                : new BadRequestException({
                    message:
                      err.code === 'LIMIT_UNEXPECTED_FILE' || err.code === 'LIMIT_FILE_COUNT'
                        ? `${field}: send one file, in the form field "${field}"`
                        : `${field}: the upload form is not right (${err.message})`,
                    code: 'bad_upload',
                  }),
            );
          } else {
            reject(new BadRequestException({ message: `${field}: the upload could not be read`, code: 'bad_upload' }));
          }
        });
      });
      return next.handle();
    }
  }
  return mixin(Interceptor);
}
