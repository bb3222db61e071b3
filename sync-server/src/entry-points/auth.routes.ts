import { Router, type RequestHandler } from 'express';

import {
  changePasswordInput,
  deleteAccountInput,
  loginInput,
  refreshInput,
  registerInput,
  resetConfirmInput,
  resetRequestInput,
  verifyEmailInput,
  type EmailVerified,
  type ResetRequested,
} from '../../../shared/api/auth';
import { publicUser, type Accounts } from '../domain/accounts';
import type { DeviceSessions } from '../domain/device-sessions';
import type { EmailVerification } from '../domain/email-verification';
import { describeError } from '../safe-log';
import type { PasswordResets } from '../domain/password-resets';
import { parseInput } from './parse-input';
import { callerOf } from './require-auth';

export interface AuthRouteDeps {
  readonly accounts: Accounts;
  readonly sessions: DeviceSessions;
  readonly resets: PasswordResets;
  readonly verification: EmailVerification;
  /** Per-reader limit on fresh confirmation links (after requireAuth). */
  readonly verifyMailLimiter: RequestHandler;
  /** Rate limiter for the routes people could hammer: sign-in, registration, resets. */
  readonly attemptLimiter: RequestHandler;
  readonly requireAuth: RequestHandler;
}

/** `/api/auth`: accounts, tokens and password resets. */
export function authRoutes({ accounts, sessions, resets, verification, verifyMailLimiter, attemptLimiter, requireAuth }: AuthRouteDeps): Router {
  const router = Router();

  router.post('/register', attemptLimiter, async (req, res) => {
    const input = parseInput(registerInput, req.body);
    res.status(201).json(await accounts.register(input, req.get('user-agent')));
  });

  router.post('/login', attemptLimiter, async (req, res) => {
    const input = parseInput(loginInput, req.body);
    res.json(await accounts.login(input, req.get('user-agent')));
  });

  router.post('/refresh', async (req, res) => {
    const { refreshToken } = parseInput(refreshInput, req.body);
    res.json(await sessions.rotate(refreshToken));
  });

  router.post('/password-reset/request', attemptLimiter, async (req, res) => {
    const { email } = parseInput(resetRequestInput, req.body);
    // Not awaited, and the same answer either way: nothing here tells whether the address exists.
    resets.request(email).catch((err: unknown) => console.warn(`reset e-mail not sent: ${describeError(err)}`));
    const body: ResetRequested = { message: 'If an account uses that address, a link to choose a new password is on its way.' };
    res.status(202).json(body);
  });

  router.post('/password-reset/confirm', attemptLimiter, async (req, res) => {
    const { token, newPassword } = parseInput(resetConfirmInput, req.body);
    await resets.confirm(token, newPassword);
    res.status(204).end();
  });

  /** The link from a welcome or confirmation mail; it works without signing in (another device). */
  router.post('/verify-email', attemptLimiter, async (req, res) => {
    const { token } = parseInput(verifyEmailInput, req.body);
    await verification.confirm(token);
    const body: EmailVerified = { verified: true };
    res.json(body);
  });

  router.post('/verify-email/send', requireAuth, verifyMailLimiter, async (_req, res) => {
    const outcome = await verification.resend(callerOf(res).userId);
    const body: EmailVerified = { verified: outcome === 'already_verified' };
    res.status(outcome === 'sent' ? 202 : 200).json(body);
  });

  router.post('/logout', requireAuth, async (_req, res) => {
    const { userId, sessionId } = callerOf(res);
    await sessions.revoke(userId, sessionId);
    res.status(204).end();
  });

  router.get('/me', requireAuth, async (_req, res) => {
    res.json(publicUser(await accounts.find(callerOf(res).userId)));
  });

  router.post('/password', requireAuth, async (req, res) => {
    const caller = callerOf(res);
    const user = await accounts.find(caller.userId);
    const input = parseInput(changePasswordInput, { ...req.body, email: user.email, displayName: user.displayName });
    await accounts.changePassword(caller.userId, caller.sessionId, input.currentPassword, input.newPassword);
    res.status(204).end();
  });

  router.delete('/account', requireAuth, async (req, res) => {
    const { password } = parseInput(deleteAccountInput, req.body);
    await accounts.deleteAccount(callerOf(res).userId, password);
    res.status(204).end();
  });

  return router;
}
