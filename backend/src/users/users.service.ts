import { subject } from '@casl/ability';
import { ForbiddenError } from '@casl/ability';
import { EntityManager, LockMode, OptimisticLockError } from '@mikro-orm/knex';
import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import type { UserDto } from '@tiermode/shared-types';
import { accessibleWhere } from '../authorization/accessible-where';
import type { AppAbility } from '../authorization/app-ability';
import type { AppEnvironment } from '../config/environment';
import { MailService } from '../mail/mail.service';
import type { CreateUserDto } from './dto/create-user.dto';
import type { UpdateUserDto } from './dto/update-user.dto';
import { hashPassword } from './password-hasher';
import { newSetPasswordToken } from './set-password-link';
import { User } from './user.entity';
import { toUserDto } from './user.mapper';

const EMAIL_TAKEN = 'email is already used by another account';

@Injectable()
export class UsersService {
  constructor(
    private readonly em: EntityManager,
    private readonly mail: MailService,
    private readonly config: ConfigService<AppEnvironment, true>,
  ) {}

  async list(ability: AppAbility): Promise<UserDto[]> {
    const where = accessibleWhere(ability, 'read', 'User');
    if (where === null) return [];
    const users = await this.em.find(User, where, { orderBy: { name: 'asc', email: 'asc' } });
    return users.map((u) => toUserDto(u));
  }

  async create(ability: AppAbility, body: CreateUserDto): Promise<UserDto> {
    ForbiddenError.from(ability).throwUnlessCan('create', 'User');
    await this.assertEmailFree(body.email);
    const user = this.em.create(User, {
      email: body.email,
      name: body.name,
      role: body.role,
      passwordHash: await hashPassword(body.password),
      licenseNumber: body.licenseNumber ?? null,
      licenseJurisdiction: body.licenseJurisdiction ?? null,
      licenseExpiresOn: body.licenseExpiresOn ?? null,
    });
    // The new person also gets a one-time link to choose a password of their own.
    this.mailSetPasswordLink(
      user,
      'Your Tiermode account',
      `${user.name}, an account has been made for you in Tiermode (${user.role}).`,
      'Your admin can also tell you the first password they set.',
    );
    await this.em.flush();
    this.mail.kick();
    return toUserDto(user);
  }

  /** Admin: mails a new set-password link; the one mailed before stops working. */
  async sendSetPasswordLink(ability: AppAbility, id: string): Promise<UserDto> {
    const user = await this.em.findOne(User, { id });
    if (!user) throw new NotFoundException(`No user with id ${id}`);
    ForbiddenError.from(ability).throwUnlessCan('update', subject('User', user));
    if (!user.active) {
      throw new ConflictException('This account is deactivated; activate it before sending a link');
    }
    this.mailSetPasswordLink(
      user,
      'Choose a new Tiermode password',
      `${user.name}, your admin sent you a link to choose a new Tiermode password.`,
      'Any link sent before this one no longer works.',
    );
    await this.em.flush();
    this.mail.kick();
    return toUserDto(user);
  }

  private mailSetPasswordLink(user: User, subject: string, opening: string, closing: string): void {
    const link = newSetPasswordToken();
    user.issueSetPasswordLink(link);
    const url = `${this.config.get('publicUrl', { infer: true })}/set-password?token=${link.token}`;
    this.mail.queue(this.em, {
      to: [user.email],
      subject,
      text:
        `${opening}\n\n` +
        `Choose your password here; the link works once, until ${link.expiresAt.toISOString()}:\n${url}\n\n` +
        closing,
    });
  }

  async update(ability: AppAbility, id: string, body: UpdateUserDto): Promise<UserDto> {
    const user = await this.em.findOne(User, { id });
    if (!user) throw new NotFoundException(`No user with id ${id}`);
    const record = subject('User', user);
    ForbiddenError.from(ability).throwUnlessCan('update', record);
    if (body.active !== undefined && body.active !== user.active) {
      ForbiddenError.from(ability).throwUnlessCan('update', record, 'active');
    }
    if (body.role !== undefined && body.role !== user.role) {
      ForbiddenError.from(ability).throwUnlessCan('update', record, 'role');
    }
    if (body.version !== undefined) {
      try {
        await this.em.lock(user, LockMode.OPTIMISTIC, body.version);
      } catch (error) {
        if (error instanceof OptimisticLockError) {
          throw new ConflictException(
            `This user was changed by someone else (version ${user.version}, yours ${body.version}); reload and try again`,
          );
        }
        throw error;
      }
    }
    if (body.email !== undefined && body.email !== user.email) {
      await this.assertEmailFree(body.email);
      user.email = body.email;
    }
    if (body.name !== undefined) user.name = body.name;
    if (body.role !== undefined) user.role = body.role;
    if (body.licenseNumber !== undefined) user.licenseNumber = body.licenseNumber;
    if (body.licenseJurisdiction !== undefined) user.licenseJurisdiction = body.licenseJurisdiction;
    if (body.licenseExpiresOn !== undefined) user.licenseExpiresOn = body.licenseExpiresOn;
    if (body.active !== undefined && body.active !== user.active) {
      user.active = body.active;
      // Deactivation ends every session at once; the JWT strategy also checks `active`.
      user.sessionVersion += 1;
    }
    if (body.password !== undefined) user.replacePassword(await hashPassword(body.password));
    await this.em.flush();
    return toUserDto(user);
  }

  private async assertEmailFree(email: string): Promise<void> {
    if ((await this.em.count(User, { email })) > 0) throw new ConflictException(EMAIL_TAKEN);
  }
}
