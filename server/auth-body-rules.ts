import { APIError, createAuthMiddleware } from 'better-auth/api';
import { z } from 'zod';
import { signUpSchema } from '@/shared/schemas/account';

/**
 * The account update takes any JSON object and hands `name` and `image` to the database as they come: an array
 * there becomes thousands of SQL parameters and a failed request. Their types (and the name's length, as at
 * sign-up) are checked before the update runs.
 */
const updateUserBodySchema = z.object({
  name: signUpSchema.shape.name.optional(),
  image: z.string().max(2048).nullable().optional(),
});

/** better-auth's `hooks.before`: refuses a malformed account body with 400 before the library acts on it. */
export const accountBodyRules = createAuthMiddleware(async (ctx) => {
  if (ctx.path !== '/update-user') return;
  const parsed = updateUserBodySchema.safeParse(ctx.body);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    throw new APIError('BAD_REQUEST', {
      code: 'VALIDATION_FAILED',
      message: `${issue?.path.join('.') || 'body'}: ${issue?.message ?? 'not valid'}`,
    });
  }
});
