import {
  BadRequestException,
  type CallHandler,
  type ExecutionContext,
  HttpException,
  type NestInterceptor,
  PayloadTooLargeException,
} from '@nestjs/common';
import { FileInterceptor } from '@nestjs/platform-express';
import type { Observable } from 'rxjs';

/**
 * Nest's multer integration (FileInterceptor) for one file in the field `file`, with every limit
 * set explicitly (multer's defaults are unlimited), held in memory and never written under the
 * name the client gave. Multer's own refusals are reworded to name the field and the limit.
 */
export function uploadLimits(maxBytes: number, label: string) {
  const Inner = FileInterceptor('file', {
    // Browsers send a file's name as UTF-8; multer would read it as Latin-1 and garble it.
    defParamCharset: 'utf8',
    limits: { fileSize: maxBytes, files: 1, fields: 4, parts: 5, fieldSize: 1024, headerPairs: 50 },
  });
  class UploadLimitsInterceptor implements NestInterceptor {
    private readonly inner = new Inner();
    async intercept(context: ExecutionContext, next: CallHandler): Promise<Observable<unknown>> {
      try {
        return await this.inner.intercept(context, next);
      } catch (error) {
        if (error instanceof PayloadTooLargeException) {
          throw new BadRequestException([`file must be at most ${label}`]);
        }
        if (error instanceof HttpException) {
          throw new BadRequestException([
            `upload one file, in the field "file", with at most 4 other fields (${error.message})`,
          ]);
        }
        throw error;
      }
    }
  }
  return UploadLimitsInterceptor;
}
