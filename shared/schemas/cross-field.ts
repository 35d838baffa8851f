// Rules between fields that run whatever else in the form is wrong, so every refusal shows at once instead of in
// waves (zod skips an object's refinements once any field has failed, unless the refinement says when to run).
import type { z } from 'zod';

/** Pass as a superRefine's params: the rule always runs and checks its own fields with `fieldsSound`. */
export const RUN_WITH_OTHER_ERRORS = { when: () => true } as const;

/** True when none of these top-level fields has an issue yet, so their values have their parsed types. */
export function fieldsSound(payload: z.core.ParsePayload, ...fields: readonly string[]): boolean {
  return !payload.issues.some((issue) => fields.includes(String(issue.path?.[0])));
}
