import { createHash, randomBytes } from 'node:crypto';
import { EntityManager } from '@mikro-orm/postgresql';
import { Injectable, Logger } from '@nestjs/common';
import type { PasswordResetConfirmInput } from '@evenset/contracts';
import { AuditService } from '../audit/audit.service';
import { AppConfig } from '../config/app-config.service';
import { MailService } from '../mail/mail.service';
import { User } from '../users/user.entity';
import { hashNewPassword } from './password';
import { ResetLinkRefusedException } from './password-reset.exception';
import { PasswordResetToken } from './password-reset-token.entity';

/** How long a reset link works, and how much randomness it carries (256 bits). */
export const RESET_LINK_MINUTES = 30;
const TOKEN_BYTES = 32;

export const tokenHash = (token: string) => createHash('sha256').update(token, 'utf8').digest('hex');

/**
 * Password reset by e-mail. Only the token's hash is stored, so the database alone cannot be used to
 * take over an account; a token works once, for thirty minutes.
 */
@Injectable()
export class PasswordResetService {
  private readonly logger = new Logger(PasswordResetService.name);

  constructor(
    private readonly em: EntityManager,
    private readonly audit: AuditService,
    private readonly mail: MailService,
    private readonly config: AppConfig,
  ) {}

  /**
   * Issues a link to an active account's address. The mail goes out after the answer, so a caller
   * cannot tell from the response (or its timing) whether the address has an account.
   */
  async request(email: string): Promise<void> {
    const em = this.em.fork();
    const user = await em.findOne(User, { email: email.trim().toLowerCase(), active: true });
    if (!user) return;
    const token = randomBytes(TOKEN_BYTES).toString('base64url');
    await em.transactional(async (tx) => {
      const row = tx.create(PasswordResetToken, {
        user,
        tokenHash: tokenHash(token),
        expiresAt: new Date(Date.now() + RESET_LINK_MINUTES * 60_000),
        createdAt: new Date(),
      });
      tx.persist(row);
      await tx.flush();
      await this.audit.recordMany(tx, null, [
        {
          action: 'user.password-reset-link',
          subjectType: 'user',
          subjectId: user.id,
          after: { expiresAt: row.expiresAt.toISOString() },
        },
      ]);
    });
    const link = `${this.baseUrl()}/reset-password?token=${token}`;
    void this.mail
      .send(
        {
          kind: 'password-reset',
          recipient: user.email,
          subject: 'Reset your Evenset password',
          subjectId: user.id,
          body: [
            `Hello ${user.displayName},`,
            '',
            'Someone (we hope you) asked to reset the password of your Evenset account.',
            `Open this link within ${RESET_LINK_MINUTES} minutes to choose a new password:`,
            '',
            link,
            '',
            'The link works once. If you did not ask for this, ignore this message: your password stays as it is.',
          ].join('\n'),
        },
        null,
      )
      .catch((error: unknown) =>
        this.logger.error(`Reset mail for ${user.id} not recorded: ${error instanceof Error ? error.message : error}`),
      );
  }

  async confirm(input: PasswordResetConfirmInput): Promise<void> {
    const passwordHash = await hashNewPassword(input.password);
    const user = await this.em.transactional(async (tx) => {
      const row = await tx.findOne(PasswordResetToken, { tokenHash: tokenHash(input.token) }, { populate: ['user'] });
      if (!row || !row.user.active) throw new ResetLinkRefusedException('unknown');
      if (row.usedAt) throw new ResetLinkRefusedException('used');
      if (row.expiresAt.getTime() <= Date.now()) throw new ResetLinkRefusedException('expired');
      // Spend the token with a guarded update, so two simultaneous uses cannot both succeed.
      const spent = await tx.nativeUpdate(PasswordResetToken, { id: row.id, usedAt: null }, { usedAt: new Date() });
      if (spent !== 1) throw new ResetLinkRefusedException('used');
      await tx.nativeUpdate(User, { id: row.user.id }, { passwordHash, updatedAt: new Date() });
      await this.audit.recordMany(tx, { id: row.user.id, displayName: row.user.displayName }, [
        { action: 'user.password-reset-by-email', subjectType: 'user', subjectId: row.user.id },
      ]);
      return row.user;
    });
    // Whoever held the old password is signed out everywhere, as on deactivation.
    await this.em.getConnection().execute(`delete from "session" where sess->'passport'->>'user' = ?`, [user.id]);
  }

  private baseUrl(): string {
    const publicUrl = this.config.get('PUBLIC_URL');
    return (publicUrl ?? `http://${this.config.get('HOST')}:${this.config.get('PORT')}`).replace(/\/+$/, '');
  }
}
