import { Injectable, UnauthorizedException, type CanActivate, type ExecutionContext } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { JwtService } from '@nestjs/jwt';
import { UsersRepository } from './users.repository.js';
import type { AuthedRequest } from './auth-user.js';
import { IS_PUBLIC } from './decorators.js';
import { passwordFingerprint, type SessionClaims } from './session-token.js';

/** Global guard: every route needs a valid bearer token unless marked @Public(). */
@Injectable()
export class JwtAuthGuard implements CanActivate {
  constructor(
    private readonly reflector: Reflector,
    private readonly jwt: JwtService,
    private readonly users: UsersRepository,
  ) {}

  async canActivate(context: ExecutionContext): Promise<boolean> {
    const isPublic = this.reflector.getAllAndOverride<boolean>(IS_PUBLIC, [context.getHandler(), context.getClass()]);
    if (isPublic) return true;
    const req = context.switchToHttp().getRequest<AuthedRequest>();
    const header = req.headers.authorization;
    const token = typeof header === 'string' && header.startsWith('Bearer ') ? header.slice(7) : undefined;
    if (!token) throw new UnauthorizedException('Sign in first: this request carries no token.');
    let payload: SessionClaims;
    try {
      payload = await this.jwt.verifyAsync<SessionClaims>(token);
    } catch {
      throw new UnauthorizedException('Your session has expired or the token is invalid: sign in again.');
    }
    const user = await this.users.findById(payload.sub);
    if (!user) throw new UnauthorizedException('This account no longer exists.');
    if (payload.pwv !== passwordFingerprint(user.passwordHash)) throw new UnauthorizedException('The password of this account has changed since you signed in: sign in again.');
    req.user = { id: user.id, email: user.email, name: user.name, organisationId: user.organisationId, isAdmin: user.isAdmin };
    return true;
  }
}
