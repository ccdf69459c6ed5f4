import { randomUUID } from 'node:crypto';
import { DateTimeType, Entity, Enum, OptionalProps, PrimaryKey, Property } from '@mikro-orm/core';
import { ROLES, type Role } from '@tiermode/shared-types';

@Entity({ tableName: 'users' })
export class User {
  [OptionalProps]?:
    | 'active'
    | 'sessionVersion'
    | 'setPasswordTokenHash'
    | 'setPasswordExpiresAt'
    | 'createdAt'
    | 'updatedAt'
    | 'version';

  @PrimaryKey({ type: 'uuid' })
  id: string = randomUUID();

  /** Stored lower-cased; sign-in compares lower-cased. */
  @Property({ type: 'string', length: 254, unique: true })
  email!: string;

  @Property({ type: 'string', length: 200 })
  name!: string;

  @Enum({ items: () => [...ROLES], type: 'string' })
  role!: Role;

  /** bcrypt hash; `hidden` keeps it out of any serialisation. */
  @Property({ type: 'string', hidden: true, lazy: true })
  passwordHash!: string;

  /** Deactivated users keep their history but cannot sign in; existing tokens stop working. */
  @Property({ type: 'boolean' })
  active: boolean = true;

  /**
   * Carried in each token as `sv`. Signing out or changing the password increments it, so every
   * token issued before stops working.
   */
  @Property({ type: 'integer' })
  sessionVersion: number = 1;

  @Property({ type: 'string', length: 100, nullable: true })
  licenseNumber: string | null = null;

  @Property({ type: 'string', length: 100, nullable: true })
  licenseJurisdiction: string | null = null;

  /** ISO date YYYY-MM-DD: the licence is current through this day. */
  @Property({ type: 'string', length: 10, nullable: true })
  licenseExpiresOn: string | null = null;

  /** SHA-256 of the one-time set-password token mailed to the user; cleared once used. */
  @Property({ type: 'string', length: 64, nullable: true, hidden: true })
  setPasswordTokenHash: string | null = null;

  @Property({ type: DateTimeType, nullable: true, hidden: true })
  setPasswordExpiresAt: Date | null = null;

  @Property({ type: DateTimeType })
  createdAt: Date = new Date();

  @Property({ type: DateTimeType, onUpdate: () => new Date() })
  updatedAt: Date = new Date();

  @Property({ type: 'integer', version: true })
  version!: number;

  /**
   * A new password, by whatever route: every session ends and any set-password link dies, so a
   * link mailed earlier cannot take the account back.
   */
  replacePassword(passwordHash: string): void {
    this.passwordHash = passwordHash;
    this.sessionVersion += 1;
    this.setPasswordTokenHash = null;
    this.setPasswordExpiresAt = null;
  }

  /** A new set-password link (its token's hash and expiry); the one before stops working. */
  issueSetPasswordLink(link: { tokenHash: string; expiresAt: Date }): void {
    this.setPasswordTokenHash = link.tokenHash;
    this.setPasswordExpiresAt = link.expiresAt;
  }
}
