import { describe, expect, it } from 'vitest';
import { authRefusal } from '@/components/forms/auth-error';
import { showServerRefusal } from '@/components/forms/server-refusal';
import { rigFieldOf, rigFieldOrder } from '@/components/rig/rig-refusal';
import type { RigInput } from '@/shared/schemas/rig';
import { ApiError, NETWORK_MESSAGE } from '@/stores/queries/api-client';

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

describe('rig form refusals', () => {
  it('when the server names three rig fields, then all are marked at once, in screen order, the first focused', () => {
    const { calls, setError } = capture();
    const error = new ApiError(400, 'validation_failed', 'Some figures need a look.', {
      'rig.propaneTanks.1.propaneKg': ['Enter at most 500 kg.'],
      'rig.battery.capacityAh': ['Enter more than 0 Ah.'],
      'rig.cabin.roofAreaM2': ['Enter at most 60 m².'],
    });
    const banner = showServerRefusal<RigInput>(error, {
      order: rigFieldOrder(Object.keys(error.fields ?? {})),
      fieldOf: rigFieldOf,
      setError,
      fallback: 'No.',
    });
    expect(banner).toBeUndefined();
    expect(calls).toEqual([
      { field: 'battery.capacityAh', message: 'Enter more than 0 Ah.', focus: true },
      { field: 'cabin.roofAreaM2', message: 'Enter at most 60 m².', focus: false },
      { field: 'propaneTanks.1.propaneKg', message: 'Enter at most 500 kg.', focus: false },
    ]);
  });

  it('when the server names a choice or a whole part, then its words go to the banner beside Save', () => {
    const { calls, setError } = capture();
    const error = new ApiError(400, 'validation_failed', 'Some figures need a look.', {
      'rig.controller': ['Solar arrays need a charge controller.'],
      'rig.solarArrays.0.ratedW': ['Enter at most 20000 W.'],
    });
    const banner = showServerRefusal<RigInput>(error, {
      order: rigFieldOrder(Object.keys(error.fields ?? {})),
      fieldOf: rigFieldOf,
      setError,
      fallback: 'No.',
    });
    expect(banner).toBe('Solar arrays need a charge controller.');
    expect(calls).toEqual([{ field: 'solarArrays.0.ratedW', message: 'Enter at most 20000 W.', focus: true }]);
  });
});

describe('account form refusals', () => {
  const ORDER_PW = ['currentPassword', 'newPassword', 'confirm'] as const;
  const fieldOfPw = (f: string) => ORDER_PW.find((x) => x === f);

  it('when the server refuses a guessable new password, then the message stands beside the new password', () => {
    const { calls, setError } = capture();
    const refusal = authRefusal({
      status: 400,
      code: 'PASSWORD_TOO_WEAK',
      message: 'Password: That password is one of the most common.',
      fields: { newPassword: ['That password is one of the most common.'] },
    });
    const banner = showServerRefusal(refusal, { order: ORDER_PW, fieldOf: fieldOfPw, setError, fallback: 'No.' });
    expect(banner).toBeUndefined();
    expect(calls).toEqual([{ field: 'newPassword', message: 'That password is one of the most common.', focus: true }]);
  });

  it('when the current password is wrong, then it is marked on the current password field', () => {
    const { calls, setError } = capture();
    const refusal = authRefusal(
      { status: 400, code: 'INVALID_PASSWORD', message: 'Your current password is not right.' },
      { INVALID_PASSWORD: 'currentPassword' },
    );
    showServerRefusal(refusal, { order: ORDER_PW, fieldOf: fieldOfPw, setError, fallback: 'No.' });
    expect(calls).toEqual([{ field: 'currentPassword', message: 'Your current password is not right.', focus: true }]);
  });

  it('when the name is refused, then the field gets the bare sentence, not the labelled banner text', () => {
    const { calls, setError } = capture();
    const refusal = authRefusal({
      status: 400,
      code: 'INVALID_NAME',
      message: 'Name: Give your name.',
      fields: { name: ['Give your name.'] },
    });
    const banner = showServerRefusal(refusal, {
      order: ['name'] as const,
      fieldOf: (f: string) => (f === 'name' ? 'name' : undefined),
      setError,
      fallback: 'No.',
    });
    expect(banner).toBeUndefined();
    expect(calls).toEqual([{ field: 'name', message: 'Give your name.', focus: true }]);
  });

  it('when there is no connection, then nothing is marked and the connection sentence is said', () => {
    const { calls, setError } = capture();
    const banner = showServerRefusal(authRefusal({ message: 'Failed to fetch' }), {
      order: ORDER_PW,
      fieldOf: fieldOfPw,
      setError,
      fallback: 'No.',
    });
    expect(calls).toEqual([]);
    expect(banner).toBe(NETWORK_MESSAGE);
  });
});
