import { describe, expect, it } from 'vitest';
import { showServerRefusal } from '@/components/forms/server-refusal';
import { ApiError } from '@/stores/queries/api-client';

type Form = { name: string; arrive: string; depart: string };
const ORDER = ['name', 'arrive', 'depart'] as const;
const fieldOf = (apiField: string) => ORDER.find((field) => `stop.${field}` === apiField);

function capture() {
  const calls: { field: string; message?: string; focus?: boolean }[] = [];
  const setError = (field: string, error: { message?: string }, options?: { shouldFocus?: boolean }) =>
    calls.push({ field, message: error.message, focus: options?.shouldFocus });
  return { calls, setError };
}

describe('showServerRefusal', () => {
  it('when the server names two fields, then both are marked and the first on screen takes the focus', () => {
    const { calls, setError } = capture();
    const error = new ApiError(422, 'unprocessable', 'Some values do not fit together.', {
      'stop.depart': ['Departure is after the trip ends (2027-09-19).'],
      'stop.name': ['Give the stop a name.'],
    });
    const banner = showServerRefusal<Form>(error, { order: ORDER, fieldOf, setError, fallback: 'No.' });
    expect(banner).toBeUndefined();
    expect(calls).toEqual([
      { field: 'name', message: 'Give the stop a name.', focus: true },
      { field: 'depart', message: 'Departure is after the trip ends (2027-09-19).', focus: false },
    ]);
  });

  it('when the server names a field the form does not show, then its message is returned for the banner', () => {
    const { calls, setError } = capture();
    const error = new ApiError(422, 'unprocessable', 'Some values do not fit together.', {
      stopIds: ['That order does not fit.'],
    });
    expect(showServerRefusal<Form>(error, { order: ORDER, fieldOf, setError, fallback: 'No.' })).toBe(
      'That order does not fit.',
    );
    expect(calls).toEqual([]);
  });

  it('when the error is not the API’s, then the fallback is said', () => {
    const { setError } = capture();
    expect(showServerRefusal<Form>(new Error('boom'), { order: ORDER, fieldOf, setError, fallback: 'No.' })).toBe(
      'No.',
    );
  });
});
