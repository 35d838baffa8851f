import { z } from 'zod';
import { nameText } from './text';

export const PASSWORD_MIN_LENGTH = 8;
export const PASSWORD_MAX_LENGTH = 128;
export const USER_NAME_MAX_LENGTH = 80;
/** What a new password must be, shown beside every field that sets one. */
export const PASSWORD_HINT = `At least ${PASSWORD_MIN_LENGTH} characters, not your e-mail address and not a common password.`;

/** A person's name as others see it on trips and clubs. */
export const userNameSchema = nameText(USER_NAME_MAX_LENGTH, { empty: 'Enter your name.' });

export const signInSchema = z.object({
  email: z.email({ error: 'Enter an e-mail address like name@example.com.' }),
  password: z.string().min(1, { error: 'Enter your password.' }),
});
export type SignInInput = z.infer<typeof signInSchema>;

export const signUpSchema = z.object({
  name: userNameSchema,
  email: z.email({ error: 'Enter an e-mail address like name@example.com.' }),
  password: z
    .string()
    .min(PASSWORD_MIN_LENGTH, { error: `Use at least ${PASSWORD_MIN_LENGTH} characters.` })
    .max(PASSWORD_MAX_LENGTH, { error: `Use at most ${PASSWORD_MAX_LENGTH} characters.` }),
});
export type SignUpInput = z.infer<typeof signUpSchema>;
