// The password rule shared by the server (sign-up, reset, change) and the forms. It carries zxcvbn's word
// lists (megabytes): the server imports it directly, the client only through a lazy import() so the lists
// never reach the web app's entry bundle (see components/forms/password-rule.ts).
import { ZxcvbnFactory, type ZxcvbnResult } from '@zxcvbn-ts/core';
import * as common from '@zxcvbn-ts/language-common';
import * as en from '@zxcvbn-ts/language-en';

/** zxcvbn scores 0–4; 0 and 1 fall to an online guess in hours or less (zxcvbn's own scale). */
export const MIN_PASSWORD_SCORE = 2;

export const PASSWORD_MESSAGES = {
  isEmail: 'Your password cannot be your e-mail address.',
  personal:
    'Your password is too close to your name, your e-mail address or the name of this app. Choose something they do not give away.',
  common:
    'That is one of the most used passwords, so it is among the first anyone would try. Choose a less common one.',
  guessable: (why: string | null) =>
    `That password would be easy to guess${why ? `: ${why}` : '.'} A few unrelated words together make a strong one.`,
} as const;

export type PasswordOwner = { email?: string | null; name?: string | null };

let estimator: ZxcvbnFactory | undefined;

// Built on first use: loading the dictionaries takes a few hundred milliseconds.
function getEstimator(): ZxcvbnFactory {
  estimator ??= new ZxcvbnFactory({
    translations: en.translations,
    graphs: common.adjacencyGraphs,
    dictionary: { ...common.dictionary, ...en.dictionary },
    // Cost grows fast with length and look-alike substitutions (p@ssw0rd): these two caps keep one check
    // under about 0.1 s even for a 128-character password. A longer password is judged by its first 64.
    maxLength: 64,
    l33tMaxSubstitutions: 4,
  });
  return estimator;
}

/** Words a guesser who knows the person would try: the address, its parts, the name and the app's own name. */
function personalWords({ email, name }: PasswordOwner): string[] {
  const words = new Set<string>(['trailtally']);
  const address = email?.trim().toLowerCase();
  if (address) {
    words.add(address);
    const local = address.split('@')[0] ?? '';
    words.add(local);
    for (const part of local.split(/[^\p{L}\p{N}]+/u)) if (part.length >= 3) words.add(part);
  }
  const fullName = name?.trim().toLowerCase();
  if (fullName) {
    words.add(fullName);
    for (const part of fullName.split(/\s+/)) if (part.length >= 3) words.add(part);
  }
  return [...words].filter(Boolean);
}

function usesPersonalWords(result: ZxcvbnResult): boolean {
  return result.sequence.some((match) => match.pattern === 'dictionary' && match.dictionaryName === 'userInputs');
}

function isCommonPassword(result: ZxcvbnResult): boolean {
  return result.sequence.some(
    (match) => match.pattern === 'dictionary' && match.dictionaryName === 'passwords-common' && match.rank <= 10_000,
  );
}

/**
 * Why a password is refused, in plain words, or undefined when it may be used. Length limits are checked
 * elsewhere (the form's schema and better-auth); this is about how guessable the password is.
 */
export function passwordProblem(password: string, owner: PasswordOwner = {}): string | undefined {
  const address = owner.email?.trim().toLowerCase();
  if (address && password.trim().toLowerCase() === address) return PASSWORD_MESSAGES.isEmail;
  const result = getEstimator().check(password, personalWords(owner));
  if (result.score >= MIN_PASSWORD_SCORE) return undefined;
  if (usesPersonalWords(result)) return PASSWORD_MESSAGES.personal;
  if (isCommonPassword(result)) return PASSWORD_MESSAGES.common;
  return PASSWORD_MESSAGES.guessable(result.feedback.warning);
}
