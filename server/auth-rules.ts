import { APIError, createAuthMiddleware, getSessionFromCtx } from 'better-auth/api';
import type { PasswordOwner } from '@/shared/password-strength';
import { PASSWORD_MIN_LENGTH, PASSWORD_MAX_LENGTH, userNameSchema } from '@/shared/schemas/account';
import { passwordChecks } from './password/password-pool';

type Body = Record<string, unknown>;

const isRecord = (value: unknown): value is Body =>
  typeof value === 'object' && value !== null && !Array.isArray(value);

/** better-auth's error body ({ code, message }) plus the field it is about, as the forms expect. */
function refuse(code: string, field: string, label: string, message: string): never {
  throw new APIError('BAD_REQUEST', { code, message: `${label}: ${message}`, fields: { [field]: [message] } });
}

/** The user's name as it will be stored (trimmed), or a 400 that names the field. */
function checkedName(value: unknown): string {
  const parsed = userNameSchema.safeParse(value ?? '');
  if (parsed.success) return parsed.data;
  refuse('INVALID_NAME', 'name', 'Name', parsed.error.issues[0]?.message ?? 'Enter your name.');
}

/**
 * Refuses a guessable password (judged in the password worker thread). Wrong types and lengths are left to
 * better-auth, which names them itself; checking length first also keeps the estimator away from oversized input.
 */
async function checkPassword(value: unknown, field: string, owner: PasswordOwner): Promise<void> {
  if (typeof value !== 'string' || value.length < PASSWORD_MIN_LENGTH || value.length > PASSWORD_MAX_LENGTH) return;
  let problem: string | undefined;
  try {
    problem = await passwordChecks.problem(value, owner);
  } catch {
    throw new APIError('SERVICE_UNAVAILABLE', {
      code: 'PASSWORD_CHECK_UNAVAILABLE',
      message: 'Passwords cannot be checked just now. Try again in a moment.',
    });
  }
  if (problem) refuse('PASSWORD_TOO_WEAK', field, 'Password', problem);
}

const text = (value: unknown) => (typeof value === 'string' ? value : undefined);

/** Longest picture address taken: far past any real one, short of a body that fills the user row. */
const IMAGE_URL_MAX = 2048;

/**
 * better-auth hands `image` to the database as it comes: a list there becomes thousands of SQL parameters and a
 * failed request. It must be text (or null, to clear it).
 */
function checkImage(value: unknown): void {
  if (value === undefined || value === null) return;
  if (typeof value !== 'string' || value.length > IMAGE_URL_MAX)
    refuse(
      'INVALID_IMAGE',
      'image',
      'Picture',
      `Give the picture's address as text of at most ${IMAGE_URL_MAX} characters.`,
    );
}

/**
 * Rules better-auth does not have, run before its endpoints: the user's name is trimmed visible text of at
 * most 80 characters; a new password is not the e-mail address nor a common or guessable one; and a password
 * change always ends the user's other sessions, whatever the client asked for.
 */
export const authRules = createAuthMiddleware(async (ctx) => {
  const body: Body = isRecord(ctx.body) ? ctx.body : {};
  switch (ctx.path) {
    case '/sign-up/email': {
      checkImage(body.image);
      const name = checkedName(body.name);
      await checkPassword(body.password, 'password', { email: text(body.email), name });
      return { context: { body: { ...body, name } } };
    }
    case '/update-user': {
      checkImage(body.image);
      if (body.name === undefined) return;
      return { context: { body: { ...body, name: checkedName(body.name) } } };
    }
    case '/reset-password': {
      const token = text(body.token) ?? text(ctx.query?.token);
      if (!token) return;
      const verification = await ctx.context.internalAdapter.findVerificationValue(`reset-password:${token}`);
      const user = verification ? await ctx.context.internalAdapter.findUserById(verification.value) : null;
      if (user) await checkPassword(body.newPassword, 'newPassword', user);
      return;
    }
    case '/change-password': {
      const session = await getSessionFromCtx(ctx);
      if (!session) return;
      await checkPassword(body.newPassword, 'newPassword', session.user);
      // A changed password ends every other session, so a stolen cookie stops working with the old password.
      return { context: { body: { ...body, revokeOtherSessions: true } } };
    }
    default:
      return;
  }
});
