// A server refusal's per-field messages, put beside the form's own fields.
import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import { ApiError } from '@/stores/queries/api-client';

type Options<T extends FieldValues> = {
  /** The form's fields in the order they appear, so the first refusal on screen is the one focused. */
  order: readonly Path<T>[];
  /** The form field that shows an API field ("stop.departAt" → "depart"); undefined when none does. */
  fieldOf: (apiField: string) => Path<T> | undefined;
  setError: UseFormSetError<T>;
  /** Said when the error is not the API's (no connection, a crash). */
  fallback: string;
};

/**
 * Marks every field the server named, focusing the first in the form's order, and returns what no field can show
 * (for a banner), or undefined when every message found its field.
 */
export function showServerRefusal<T extends FieldValues>(error: unknown, options: Options<T>): string | undefined {
  if (!(error instanceof ApiError)) return options.fallback;
  if (!error.fields) return error.message;
  const byField = new Map<Path<T>, string>();
  const leftOver: string[] = [];
  for (const [apiField, messages] of Object.entries(error.fields)) {
    const field = options.fieldOf(apiField);
    const message = messages.join(' ');
    if (field) byField.set(field, byField.has(field) ? `${byField.get(field)} ${message}` : message);
    else leftOver.push(message);
  }
  const ordered = options.order.filter((field) => byField.has(field));
  ordered.forEach((field, i) =>
    options.setError(field, { type: 'server', message: byField.get(field) }, { shouldFocus: i === 0 }),
  );
  if (leftOver.length > 0) return leftOver.join(' ');
  return ordered.length > 0 ? undefined : error.message;
}
