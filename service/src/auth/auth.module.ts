import { Global, Module } from '@nestjs/common';
import { APP_GUARD } from '@nestjs/core';
import { JwtModule } from '@nestjs/jwt';
import { AssetsRepository } from '../assets/assets.repository.js';
import { APP_CONFIG, type AppConfig } from '../config/app-config.js';
import { JWT_SECRET } from '../config/jwt-secret.js';
import { AssetAccessGuard } from './asset-access.guard.js';
import { AuthController } from './auth.controller.js';
import { AuthService } from './auth.service.js';
import { JwtAuthGuard } from './jwt-auth.guard.js';
import { UsersRepository } from './users.repository.js';

@Global()
@Module({
  imports: [
    JwtModule.registerAsync({
      inject: [APP_CONFIG, JWT_SECRET],
      useFactory: (config: AppConfig, secret: string) => ({
        secret,
        signOptions: { expiresIn: config.jwtTtl as `${number}h` },
      }),
    }),
  ],
  controllers: [AuthController],
  providers: [
    AuthService,
    UsersRepository,
    AssetsRepository,
    { provide: APP_GUARD, useClass: JwtAuthGuard },
    { provide: APP_GUARD, useClass: AssetAccessGuard },
  ],
  exports: [AuthService, UsersRepository, AssetsRepository],
})
export class AuthModule {}
