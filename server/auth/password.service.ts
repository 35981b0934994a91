import type { DataSource, EntityManager } from 'typeorm';
import { passwordProblem, RESET_LINK_MINUTES } from '../../shared/passwords';
import { audit } from '../audit/audit';
import { fieldError, HttpError, notFound, ValidationFailed, type FieldProblem } from '../common/errors';
import { User } from '../entities';
import { enqueueAccountMail, publicUrl } from '../mail/outbox';
import type { PasswordResetAnswer, SignInResult } from '../../shared/contract/users';
import { toUserRecord } from './auth.service';
import { hashPassword, hashResetToken, newResetToken, temporaryPassword, verifyPassword } from './passwords';
import { sessionToken } from './tokens';

/** A wrong current password: a 400 naming the field (a 401 would end the session in the client), counted by the router's limiter. */
export class WrongCurrentPassword extends ValidationFailed {}

const WRONG_CURRENT = 'is not right; check it and try again';

const linkInvalid = () =>
  new HttpError(400, 'reset_link_invalid', 'This reset link has been used or has expired. Ask for a new one from the sign-in screen.', [
    { field: 'token', messages: ['has been used or has expired'] },
  ]);

/** The new password against the shared rule, as a field problem, or nothing. */
function ruleProblems(field: string, password: string): FieldProblem[] {
  const problem = passwordProblem(password);
  return problem ? [{ field, messages: [problem] }] : [];
}

export class PasswordService {
  constructor(
    private readonly ds: DataSource,
    private readonly secret: string,
  ) {}

  private withHash(m: EntityManager | DataSource, id: string): Promise<User | null> {
    return m.getRepository(User).createQueryBuilder('u').addSelect('u.passwordHash').where('u.id = :id', { id }).getOne();
  }

  /**
   * Stores a new hash and bumps the session epoch in one statement (two changes at once cannot both keep the
   * old epoch), and closes the person's open reset links: a password set any way makes older links useless.
   */
  private async setPassword(m: EntityManager, id: string, hash: string, mustChange: boolean): Promise<User> {
    await m.query(
      `UPDATE users SET password_hash = $2, must_change_password = $3, session_epoch = session_epoch + 1, password_changed_at = now(), updated_at = now(), version = version + 1 WHERE id = $1`,
      [id, hash, mustChange],
    );
    await m.query(`UPDATE password_resets SET used_at = now(), updated_at = now(), version = version + 1 WHERE user_id = $1 AND used_at IS NULL`, [id]);
    return m.getRepository(User).findOneByOrFail({ id });
  }

  /** The signed-in person's own change. Answers a fresh token: every other session of theirs ends, this one goes on. */
  async change(userId: string, currentPassword: string, newPassword: string): Promise<SignInResult> {
    const user = await this.withHash(this.ds, userId);
    if (!user) throw notFound('User');
    const problems = ruleProblems('newPassword', newPassword);
    const currentOk = await verifyPassword(currentPassword, user.passwordHash);
    if (!currentOk) throw new WrongCurrentPassword([{ field: 'currentPassword', messages: [WRONG_CURRENT] }, ...problems]);
    if (!problems.length && (await verifyPassword(newPassword, user.passwordHash))) problems.push({ field: 'newPassword', messages: ['must differ from your current password'] });
    if (problems.length) throw new ValidationFailed(problems);
    const hash = await hashPassword(newPassword);
    return this.ds.transaction(async (m) => {
      const saved = await this.setPassword(m, userId, hash, false);
      await audit(m, {
        userId,
        action: 'password-change',
        entity: 'users',
        entityId: userId,
        summary: `Password changed by ${saved.email}; their other sessions ended`,
        after: { sessionEpoch: saved.sessionEpoch },
      });
      return { token: sessionToken(saved, this.secret), user: toUserRecord(saved) };
    });
  }

  /** An administrator's reset: a temporary password made here and shown once; the person must change it after signing in. */
  async adminReset(targetId: string, actingUserId: string): Promise<PasswordResetAnswer> {
    if (targetId === actingUserId) throw fieldError('id', 'is your own account: change your own password under Notices');
    if (!(await this.ds.getRepository(User).existsBy({ id: targetId }))) throw notFound('User');
    const temporary = temporaryPassword();
    const hash = await hashPassword(temporary);
    return this.ds.transaction(async (m) => {
      const saved = await this.setPassword(m, targetId, hash, true);
      await audit(m, {
        userId: actingUserId,
        action: 'password-reset',
        entity: 'users',
        entityId: targetId,
        summary: `Password reset by an administrator for ${saved.email}; temporary password issued, all sessions ended`,
        after: { mustChangePassword: true, sessionEpoch: saved.sessionEpoch },
      });
      return { user: toUserRecord(saved), temporaryPassword: temporary };
    });
  }

  /**
   * "Forgot password": for an active account, a single-use link through the outbox, written with its token in
   * one transaction. Returns nothing either way: the caller answers the same whether the address exists.
   */
  async requestReset(email: string): Promise<void> {
    const user = await this.ds.getRepository(User).findOneBy({ email: email.trim().toLowerCase() });
    if (!user || !user.active) return;
    const { token, hash } = newResetToken();
    await this.ds.transaction(async (m) => {
      // The database's clock sets and checks the expiry, so several servers with drifting clocks agree.
      await m.query(`INSERT INTO password_resets (user_id, token_hash, expires_at) VALUES ($1, $2, now() + make_interval(mins => $3))`, [user.id, hash, RESET_LINK_MINUTES]);
      await enqueueAccountMail(m, user, {
        kind: 'password-reset',
        title: 'Choose a new password',
        body: `Someone, hopefully you, asked to reset the Bungwise password of ${user.email}. The link below works once, for ${RESET_LINK_MINUTES} minutes. If it was not you, ignore this mail: your password stays as it is.`,
        // In the fragment, which browsers never send to a server: the token stays out of request logs and Referer headers.
        link: publicUrl(`/reset-password#token=${token}`),
        linkLabel: 'Choose a new password',
        footer: 'This mail is about your own account, so it is sent whatever you chose under Notices.',
      });
      await audit(m, { userId: user.id, action: 'reset-link-sent', entity: 'users', entityId: user.id, summary: `Password reset link sent to ${user.email}` });
    });
  }

  /** Sets the password from an e-mailed link: the link is spent in the same statement that checks it, so it works once. */
  async resetWithToken(token: string, newPassword: string): Promise<void> {
    const problems = ruleProblems('newPassword', newPassword);
    if (problems.length) throw new ValidationFailed(problems);
    const hash = await hashPassword(newPassword);
    await this.ds.transaction(async (m) => {
      const [spent] = (await m.query(
        `UPDATE password_resets r SET used_at = now(), updated_at = now(), version = r.version + 1 FROM users u
         WHERE r.token_hash = $1 AND r.used_at IS NULL AND r.expires_at > now() AND u.id = r.user_id AND u.active RETURNING r.user_id`,
        [hashResetToken(token)],
      )) as [Array<{ user_id: string }>, number];
      const userId = spent[0]?.user_id;
      if (!userId) throw linkInvalid();
      const saved = await this.setPassword(m, userId, hash, false);
      await audit(m, {
        userId,
        action: 'password-reset',
        entity: 'users',
        entityId: userId,
        summary: `Password reset through an e-mailed link by ${saved.email}; all sessions ended`,
        after: { sessionEpoch: saved.sessionEpoch },
      });
    });
  }
}
