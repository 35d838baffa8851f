import { z } from 'zod';

export const PASSWORD_MIN_LENGTH = 8;

export const signInSchema = z.object({
  email: z.email({ error: 'Enter an e-mail address like name@example.com.' }),
  password: z.string().min(1, { error: 'Enter your password.' }),
});
export type SignInInput = z.infer<typeof signInSchema>;

export const signUpSchema = z.object({
  name: z.string().trim().min(1, { error: 'Enter your name.' }).max(80, { error: 'Use at most 80 characters.' }),
  email: z.email({ error: 'Enter an e-mail address like name@example.com.' }),
  password: z
    .string()
    .min(PASSWORD_MIN_LENGTH, { error: `Use at least ${PASSWORD_MIN_LENGTH} characters.` })
    .max(128, { error: 'Use at most 128 characters.' }),
});
export type SignUpInput = z.infer<typeof signUpSchema>;
