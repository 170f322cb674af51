import { Catch, Inject, PayloadTooLargeException, type ArgumentsHost, type ExceptionFilter } from '@nestjs/common';
import type { Response } from 'express';
import { APP_CONFIG, type AppConfig } from '../config/app-config.js';

/** Turns multer's bare "File too large" into a 413 that says what the limit is. */
@Catch(PayloadTooLargeException)
export class PayloadTooLargeFilter implements ExceptionFilter {
  constructor(@Inject(APP_CONFIG) private readonly config: AppConfig) {}

  catch(_: PayloadTooLargeException, host: ArgumentsHost): void {
    const mb = Math.round((this.config.uploadMaxBytes / 1024 / 1024) * 10) / 10;
    host
      .switchToHttp()
      .getResponse<Response>()
      .status(413)
      .json({
        statusCode: 413,
        error: 'Payload Too Large',
        message: `A file is larger than the upload limit of ${mb} MB; nothing was stored. Split the file or ask an admin to raise UPLOAD_MAX_MB.`,
      });
  }
}
