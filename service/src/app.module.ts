import { Module, type DynamicModule } from '@nestjs/common';
import { APP_FILTER } from '@nestjs/core';
import { ServeStaticModule } from '@nestjs/serve-static';
import type { OpenDatabase } from '@poreline/schema';
import { existsSync } from 'node:fs';
import { AssetsModule } from './assets/assets.module.js';
import { AuditModule } from './audit/audit.module.js';
import { AuthModule } from './auth/auth.module.js';
import { PayloadTooLargeFilter } from './common/payload-too-large.filter.js';
import { APP_CONFIG, type AppConfig } from './config/app-config.js';
import { JWT_SECRET, resolveJwtSecret } from './config/jwt-secret.js';
import { DatabaseModule } from './database/database.module.js';
import { DemoCheckModule } from './demo-check/demo-check.module.js';
import { HealthModule } from './health/health.module.js';
import { LogRunsModule } from './log-runs/log-runs.module.js';
import { MailModule } from './mail/mail.module.js';
import { ProductionModule } from './production/production.module.js';
import { ReservesCasesModule } from './reserves-cases/reserves-cases.module.js';
import { SeedModule } from './seed/seed.module.js';
import { SetupModule } from './setup/setup.module.js';
import { UsersModule } from './users/users.module.js';
import { WellsModule } from './wells/wells.module.js';
import { WORKBENCH_MODULES } from './workbench/workbench-modules.js';

@Module({})
export class AppModule {
  /** The whole app on an open (migrated) database. */
  static forRoot(config: AppConfig, database: OpenDatabase): DynamicModule {
    const staticUi = config.uiDist && existsSync(config.uiDist) ? [ServeStaticModule.forRoot({ rootPath: config.uiDist, exclude: ['/api/{*path}'] })] : [];
    return {
      module: AppModule,
      global: true,
      imports: [
        DatabaseModule.forHandle(database),
        AuditModule,
        MailModule,
        AuthModule,
        AssetsModule,
        WellsModule,
        LogRunsModule,
        ProductionModule,
        ReservesCasesModule,
        HealthModule,
        SetupModule,
        UsersModule,
        SeedModule,
        DemoCheckModule,
        ...WORKBENCH_MODULES,
        ...staticUi,
      ],
      providers: [
        { provide: APP_CONFIG, useValue: config },
        { provide: JWT_SECRET, useValue: resolveJwtSecret(config) },
        { provide: APP_FILTER, useClass: PayloadTooLargeFilter },
      ],
      exports: [APP_CONFIG, JWT_SECRET],
    };
  }
}
