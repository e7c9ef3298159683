import type { DataSource } from 'typeorm';
import type { LoginBody, RegisterBody } from '../../shared/schemas/auth.schema.js';
import type { Mailer } from '../adapters/email.js';
import { User } from '../db/entities/user.entity.js';
import { passwordResetMail, verifyEmailMail } from '../domain/auth-emails.js';
import { AppError, ConflictError } from '../errors.js';
import type { AuthTokenService } from './auth-token.service.js';
import type { PasswordHasher } from './password-hasher.js';

export interface AuthDeps {
  db: DataSource;
  hasher: PasswordHasher;
  tokens: AuthTokenService;
  mailer: Mailer;
  appUrl: string;
  clock: () => Date;
  log: (line: string) => void;
}

const RESET_MINUTES = 60;
const VERIFY_MINUTES = 7 * 24 * 60;

export interface GoogleIdentity {
  sub: string;
  email: string;
  name: string;
  emailVerified: boolean;
}

const invalidToken = () => new AppError(400, 'invalid_token', 'This link is invalid, expired or already used');

export function createAuthService(deps: AuthDeps) {
  const users = deps.db.getRepository(User);
  // Verifying against a throwaway hash keeps unknown e-mails as slow as wrong passwords.
  const decoy = deps.hasher.hash('decoy-password-for-timing');

  /** Mail failures must not undo the account change; they are logged for the coordinator. */
  async function sendQuietly(send: () => Promise<void>): Promise<void> {
    try {
      await send();
    } catch (err) {
      deps.log(`Sending mail failed: ${String(err)}`);
    }
  }

  async function sendVerification(user: User): Promise<void> {
    const token = await deps.tokens.issue(user.id, 'email_verification', VERIFY_MINUTES);
    const mail = verifyEmailMail(user.name, `${deps.appUrl}/verify-email?token=${token}`);
    await sendQuietly(() => deps.mailer.send({ to: user.email, ...mail }));
  }

  return {
    async register(body: RegisterBody): Promise<User> {
      if (await users.existsBy({ email: body.email })) {
        throw new ConflictError('An account with this e-mail already exists', { email: ['is already registered'] });
      }
      const user = await users.save(users.create({ ...body, passwordHash: await deps.hasher.hash(body.password), role: 'volunteer' }));
      await sendVerification(user);
      return user;
    },

    async authenticate(body: LoginBody): Promise<User | undefined> {
      const user = await users.findOneBy({ email: body.email });
      const ok = await deps.hasher.verify(body.password, user?.passwordHash ?? (await decoy));
      return ok && user?.passwordHash ? user : undefined;
    },

    /** Finds the account by Google id, else links it by a Google-verified e-mail, else creates a volunteer. */
    async signInWithGoogle(identity: GoogleIdentity): Promise<User> {
      const known = await users.findOneBy({ googleId: identity.sub });
      if (known) return known;
      const email = identity.email.trim().toLowerCase();
      const byEmail = await users.findOneBy({ email });
      if (byEmail) {
        if (!identity.emailVerified) throw new AppError(401, 'invalid_credentials', 'Google has not verified this e-mail');
        byEmail.googleId = identity.sub;
        byEmail.emailVerifiedAt ??= deps.clock();
        return users.save(byEmail);
      }
      const verifiedAt = identity.emailVerified ? deps.clock() : null;
      const created = users.create({ email, name: identity.name || email, googleId: identity.sub, role: 'volunteer', passwordHash: null, emailVerifiedAt: verifiedAt });
      return users.save(created);
    },

    /** Always looks the same from outside, whether or not the e-mail has an account. */
    async requestPasswordReset(email: string): Promise<void> {
      const user = await users.findOneBy({ email });
      if (!user) return;
      const token = await deps.tokens.issue(user.id, 'password_reset', RESET_MINUTES);
      const mail = passwordResetMail(user.name, `${deps.appUrl}/reset-password?token=${token}`, RESET_MINUTES);
      await sendQuietly(() => deps.mailer.send({ to: user.email, ...mail }));
    },

    /** Sets the new password, retires other reset links and signs the account out everywhere. */
    async resetPassword(token: string, password: string): Promise<void> {
      const userId = await deps.tokens.consume(token, 'password_reset');
      if (!userId) throw invalidToken();
      await users.update({ id: userId }, { passwordHash: await deps.hasher.hash(password) });
      await deps.tokens.revokeAll(userId, 'password_reset');
      await deps.db.query(`DELETE FROM "session" WHERE sess->'passport'->>'user' = $1`, [userId]);
    },

    async verifyEmail(token: string): Promise<User> {
      const userId = await deps.tokens.consume(token, 'email_verification');
      const user = userId ? await users.findOneBy({ id: userId }) : null;
      if (!user) throw invalidToken();
      user.emailVerifiedAt ??= deps.clock();
      return users.save(user);
    },

    async resendVerification(user: User): Promise<void> {
      if (user.emailVerifiedAt) return;
      await deps.tokens.revokeAll(user.id, 'email_verification');
      await sendVerification(user);
    },
  };
}
export type AuthService = ReturnType<typeof createAuthService>;
