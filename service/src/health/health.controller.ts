import { Controller, Get, ServiceUnavailableException } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { Public } from '../auth/decorators.js';
import { DatabaseService } from '../database/database.module.js';

@ApiTags('health')
@Controller('health')
export class HealthController {
  constructor(private readonly database: DatabaseService) {}

  /** 200 with the database reachable; 503 when it does not answer. */
  @Public()
  @Get()
  async health(): Promise<{ status: 'ok'; database: 'reachable' }> {
    const ok = await this.database.ping().catch(() => false);
    if (!ok) throw new ServiceUnavailableException({ status: 'degraded', database: 'unreachable' });
    return { status: 'ok', database: 'reachable' };
  }
}
