import { BadRequestException, ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import type { User } from '@poreline/schema';
import bcrypt from 'bcryptjs';
import type { AuthUser } from '../auth/auth-user.js';
import { AuthService } from '../auth/auth.service.js';
import { UsersRepository } from '../auth/users.repository.js';
import { isUuid } from '../common/ids.js';
import type { ChangePasswordDto, CreateUserDto, UpdateUserDto, UserDto } from './dto/user.dto.js';
import { isUniqueViolation, UserAccountsRepository, type AccountMembership } from './user-accounts.repository.js';

/** bcrypt cost of stored passwords (the same as the first admin's, setup.controller.ts). */
const BCRYPT_ROUNDS = 10;

/**
 * Accounts of an organisation, managed by its global admins. Passwords are only ever stored as
 * bcrypt hashes and never written to the audit log (a reset shows as `passwordReset: true`).
 */
@Injectable()
export class UsersService {
  constructor(
    private readonly accounts: UserAccountsRepository,
    private readonly signIn: UsersRepository,
    private readonly auth: AuthService,
  ) {}

  async list(admin: AuthUser): Promise<UserDto[]> {
    const rows = await this.accounts.listByOrganisation(admin.organisationId);
    const memberships = await this.accounts.membershipsOf(rows.map((u) => u.id));
    return rows.map((u) => toUserDto(u, memberships));
  }

  /** A new account in the admin's organisation; 409 when the e-mail is taken (e-mails are unique across the installation). */
  async create(body: CreateUserDto, admin: AuthUser): Promise<UserDto> {
    const email = body.email.trim().toLowerCase();
    const taken = `email: an account with the e-mail ${email} already exists.`;
    if (await this.signIn.findByEmail(email)) throw new ConflictException(taken);
    const passwordHash = await bcrypt.hash(body.password, BCRYPT_ROUNDS);
    try {
      const user = await this.accounts.insert({ organisationId: admin.organisationId, email, name: body.name.trim(), passwordHash, isAdmin: body.isAdmin ?? false }, (row) => ({
        assetId: null,
        userId: admin.id,
        action: 'create',
        entity: 'user',
        entityId: row.id,
        after: { email: row.email, name: row.name, isAdmin: row.isAdmin },
      }));
      return toUserDto(user, []);
    } catch (error) {
      if (isUniqueViolation(error)) throw new ConflictException(taken);
      throw error;
    }
  }

  /** Renames, grants or withdraws global admin, or resets the password of an account of the admin's organisation. */
  async update(userId: string, body: UpdateUserDto, admin: AuthUser): Promise<UserDto> {
    const user = await this.require(admin.organisationId, userId);
    const name = body.name?.trim();
    if (body.isAdmin === false && user.isAdmin && (await this.accounts.countAdmins(admin.organisationId)) === 1) {
      throw new ConflictException('isAdmin: this is the last admin of the organisation; make another user admin first.');
    }
    const patch: Partial<Pick<User, 'name' | 'isAdmin' | 'passwordHash'>> = {};
    if (name !== undefined && name !== user.name) patch.name = name;
    if (body.isAdmin !== undefined && body.isAdmin !== user.isAdmin) patch.isAdmin = body.isAdmin;
    if (body.password !== undefined) patch.passwordHash = await bcrypt.hash(body.password, BCRYPT_ROUNDS);
    const memberships = await this.accounts.membershipsOf([user.id]);
    if (!Object.keys(patch).length) return toUserDto(user, memberships);
    const shown = (['name', 'isAdmin'] as const).filter((f) => f in patch);
    const pick = (u: User) => Object.fromEntries(shown.map((f) => [f, u[f]]));
    const row = await this.accounts.update(user.id, patch, (after) => ({
      assetId: null,
      userId: admin.id,
      action: 'update',
      entity: 'user',
      entityId: user.id,
      before: { email: user.email, ...pick(user) },
      after: { email: after.email, ...pick(after), ...(patch.passwordHash ? { passwordReset: true } : {}) },
    }));
    return toUserDto(row, memberships);
  }

  /**
   * The signed-in user changes their own password; the current one must be given. Every session
   * opened with the old password ends (session-token.ts); the caller gets a new token for this one.
   */
  async changeOwnPassword(body: ChangePasswordDto, me: AuthUser): Promise<{ token: string }> {
    const user = await this.require(me.organisationId, me.id);
    if (!(await bcrypt.compare(body.currentPassword, user.passwordHash))) throw new BadRequestException('currentPassword is not your current password.');
    if (body.newPassword === body.currentPassword) throw new BadRequestException('newPassword must differ from the current password.');
    const passwordHash = await bcrypt.hash(body.newPassword, BCRYPT_ROUNDS);
    const after = await this.accounts.update(user.id, { passwordHash }, () => ({ assetId: null, userId: me.id, action: 'update', entity: 'user', entityId: me.id, after: { email: user.email, passwordChanged: true } }));
    return { token: await this.auth.tokenFor(after) };
  }

  /** The account, if it belongs to the organisation; 404 otherwise (no reading across organisations). */
  private async require(organisationId: string, userId: string): Promise<User> {
    const user = isUuid(userId) ? await this.accounts.findInOrganisation(organisationId, userId) : undefined;
    if (!user) throw new NotFoundException('No such user in your organisation.');
    return user;
  }
}

function toUserDto(user: User, memberships: AccountMembership[]): UserDto {
  return {
    id: user.id,
    email: user.email,
    name: user.name,
    isAdmin: user.isAdmin,
    createdAt: user.createdAt.toISOString(),
    memberships: memberships.filter((m) => m.userId === user.id).map(({ assetId, assetName, role }) => ({ assetId, assetName, role })),
  };
}
