import { Injectable, UnauthorizedException } from '@nestjs/common';
import { JwtService } from '@nestjs/jwt';
import bcrypt from 'bcryptjs';
import type { User } from '@poreline/schema';
import type { LoginResultDto, MeDto } from './dto/me.dto.js';
import { passwordFingerprint, type SessionClaims } from './session-token.js';
import { UsersRepository } from './users.repository.js';

/** A hash to compare against when the e-mail is unknown, so both failures take the same time. */
const DUMMY_HASH = bcrypt.hashSync('not-a-password', 10);

@Injectable()
export class AuthService {
  constructor(
    private readonly users: UsersRepository,
    private readonly jwt: JwtService,
  ) {}

  async login(email: string, password: string): Promise<LoginResultDto> {
    const user = await this.users.findByEmail(email);
    const ok = await bcrypt.compare(password, user?.passwordHash ?? DUMMY_HASH);
    if (!user || !ok) throw new UnauthorizedException('E-mail or password is wrong.');
    return { token: await this.tokenFor(user), user: await this.me(user) };
  }

  /** A sign-in token for the account as it is now (see session-token.ts). */
  tokenFor(user: Pick<User, 'id' | 'passwordHash'>): Promise<string> {
    const claims: SessionClaims = { sub: user.id, pwv: passwordFingerprint(user.passwordHash) };
    return this.jwt.signAsync(claims);
  }

  async me(user: Pick<User, 'id' | 'email' | 'name' | 'isAdmin' | 'organisationId'>): Promise<MeDto> {
    return {
      id: user.id,
      email: user.email,
      name: user.name,
      isAdmin: user.isAdmin,
      memberships: await this.users.memberships(user),
    };
  }
}
