import { Router, type Request } from 'express';
import type { PassportInstance } from '../adapters/google-auth.js';
import { LoginBody, RegisterBody, RequestPasswordResetBody, ResetPasswordBody, VerifyEmailBody } from '../../shared/schemas/auth.schema.js';
import { AppError } from '../errors.js';
import { currentUser, requireAuth } from '../middleware/auth.js';
import { csrfTokenFor } from '../middleware/csrf.js';
import { registrationLimiter, resetRequestLimiter, signInLimiters } from '../middleware/rate-limits.js';
import type { AuthService } from '../services/auth.service.js';
import { toPublicUser } from '../services/user.service.js';

/** passport's req.login (which regenerates the session id) as a promise. */
const signIn = (req: Request, user: Express.User) =>
  new Promise<void>((resolve, reject) => req.login(user, (err: unknown) => (err ? reject(err) : resolve())));
const signOut = (req: Request) =>
  new Promise<void>((resolve, reject) => req.logout((err: unknown) => (err ? reject(err) : resolve())));

export function authRouter(deps: { auth: AuthService; passport: PassportInstance }): Router {
  const r = Router();
  const { auth, passport } = deps;

  r.get('/csrf', (req, res) => {
    res.json({ token: csrfTokenFor(req) });
  });

  r.get('/me', requireAuth, (req, res) => {
    res.json({ user: toPublicUser(currentUser(req)) });
  });

  r.post('/register', registrationLimiter(), async (req, res) => {
    const user = await auth.register(RegisterBody.parse(req.body));
    await signIn(req, user);
    res.status(201).json({ user: toPublicUser(user) });
  });

  r.post('/login', ...signInLimiters(), async (req, res) => {
    const user = await auth.authenticate(LoginBody.parse(req.body));
    if (!user) throw new AppError(401, 'invalid_credentials', 'E-mail or password is wrong');
    await signIn(req, user);
    res.json({ user: toPublicUser(user) });
  });

  r.post('/logout', async (req, res) => {
    await signOut(req);
    await new Promise<void>((resolve) => req.session.destroy(() => resolve()));
    res.clearCookie('ebbroot.sid').status(204).end();
  });

  r.get('/google', passport.authenticate('google', { scope: ['openid', 'profile', 'email'] }));
  r.get('/google/callback', passport.authenticate('google', { failureRedirect: '/login?error=google' }), (_req, res) => {
    res.redirect('/');
  });

  r.post('/password-reset/request', resetRequestLimiter(), async (req, res) => {
    await auth.requestPasswordReset(RequestPasswordResetBody.parse(req.body).email);
    res.status(202).json({ ok: true });
  });

  r.post('/password-reset/confirm', async (req, res) => {
    const body = ResetPasswordBody.parse(req.body);
    await auth.resetPassword(body.token, body.password);
    res.status(204).end();
  });

  r.post('/verify-email', async (req, res) => {
    const user = await auth.verifyEmail(VerifyEmailBody.parse(req.body).token);
    res.json({ user: toPublicUser(user) });
  });

  r.post('/verify-email/resend', requireAuth, async (req, res) => {
    await auth.resendVerification(currentUser(req));
    res.status(202).json({ ok: true });
  });

  return r;
}
