import { Catch, Inject, PayloadTooLargeException, type ArgumentsHost, type ExceptionFilter } from '@nestjs/common';
import type { Request, Response } from 'express';
import { APP_CONFIG, type AppConfig } from '../config/app-config.js';
import { uploadLimitFor } from './upload-limits.js';

/** Turns multer's bare "File too large" into a 413 that says what the limit of the refused route is. */
@Catch(PayloadTooLargeException)
export class PayloadTooLargeFilter implements ExceptionFilter {
  constructor(@Inject(APP_CONFIG) private readonly config: AppConfig) {}

  catch(_: PayloadTooLargeException, host: ArgumentsHost): void {
    const http = host.switchToHttp();
    const limit = uploadLimitFor(http.getRequest<Request>().originalUrl ?? '', this.config);
    const mb = Math.round((limit.bytes / 1024 / 1024) * 10) / 10;
    http
      .getResponse<Response>()
      .status(413)
      .json({
        statusCode: 413,
        error: 'Payload Too Large',
        message: `A file is larger than the upload limit of ${mb} MB for this request; nothing was stored. ${limit.advice}`,
      });
  }
}
