import { Body, ConflictException, Controller, Get, Post } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { organisations, users } from '@poreline/schema';
import bcrypt from 'bcryptjs';
import { AuthService } from '../auth/auth.service.js';
import { Public } from '../auth/decorators.js';
import { UsersRepository } from '../auth/users.repository.js';
import type { LoginResultDto } from '../auth/dto/me.dto.js';
import { DatabaseService } from '../database/database.module.js';
import { FirstAdminDto } from './dto/first-admin.dto.js';

/** First start of a real deployment (DEMO_MODE=false): no users yet, so ask for the first admin. */
@ApiTags('setup')
@Controller('setup')
export class SetupController {
  constructor(
    private readonly users: UsersRepository,
    private readonly database: DatabaseService,
    private readonly auth: AuthService,
  ) {}

  @Public()
  @Get()
  async status(): Promise<{ needsFirstAdmin: boolean }> {
    return { needsFirstAdmin: (await this.users.count()) === 0 };
  }

  /** Creates the organisation and its first admin; refused (409) once any user exists. */
  @Public()
  @Post()
  async createFirstAdmin(@Body() body: FirstAdminDto): Promise<LoginResultDto> {
    const hash = await bcrypt.hash(body.password, 10);
    await this.database.db.transaction(async (tx) => {
      // Lock-free guard: the unique email index and this count inside the transaction.
      const existing = await tx.select({ id: users.id }).from(users).limit(1);
      if (existing.length) throw new ConflictException('Set-up is done already: an admin exists. Sign in instead.');
      const [org] = await tx.insert(organisations).values({ name: body.organisation.trim() }).returning();
      await tx.insert(users).values({ organisationId: org.id, email: body.email.trim().toLowerCase(), name: body.name.trim(), passwordHash: hash, isAdmin: true });
    });
    return this.auth.login(body.email, body.password);
  }
}
