import { ValidationPipe, type INestApplication } from '@nestjs/common';
import { NestFactory } from '@nestjs/core';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { DocumentBuilder, SwaggerModule } from '@nestjs/swagger';
import { openDatabase } from '@poreline/schema';
import { mkdirSync } from 'node:fs';
import { AppModule } from './app.module.js';
import type { AppConfig } from './config/app-config.js';
import { DemoSeedService } from './seed/demo-seed.service.js';

/** Shared by main.ts and the API tests: prefix, validation, OpenAPI at /api/docs. */
export function configureApp(app: INestApplication): void {
  app.setGlobalPrefix('api');
  app.useGlobalPipes(new ValidationPipe({ whitelist: true, forbidNonWhitelisted: true, transform: true }));
  const doc = new DocumentBuilder()
    .setTitle('Poreline API')
    .setDescription('Well logs to net pay and hydrocarbon volumes. Results are estimates; reserves classification needs a qualified evaluator and the applicable rules (SPE-PRMS or the local regulator).')
    .setVersion('0.1.0')
    .addBearerAuth()
    .build();
  SwaggerModule.setup('api/docs', app, () => SwaggerModule.createDocument(app, doc));
  app.enableShutdownHooks();
}

/** Opens and migrates the database, builds the app, seeds the demo in demo mode. */
export async function createApp(config: AppConfig, options: { logger?: false } = {}): Promise<NestExpressApplication> {
  if (!config.databaseUrl && !config.dataDir.startsWith('memory://')) mkdirSync(config.dataDir, { recursive: true });
  const database = await openDatabase({ url: config.databaseUrl, dataDir: config.dataDir });
  await database.migrate();
  const app = await NestFactory.create<NestExpressApplication>(AppModule.forRoot(config, database), {
    logger: options.logger ?? ['error', 'warn', 'log'],
  });
  configureApp(app);
  await app.init();
  if (config.demoMode) await app.get(DemoSeedService).seed();
  return app;
}
