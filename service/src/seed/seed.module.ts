import { Module } from '@nestjs/common';
import { DemoFieldSeeder } from './demo-field.seeder.js';
import { DemoSeedService } from './demo-seed.service.js';

@Module({ providers: [DemoSeedService, DemoFieldSeeder], exports: [DemoSeedService] })
export class SeedModule {}
