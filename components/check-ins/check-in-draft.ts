// The check-in form's state and its translation to the API's fields, kept apart from React so it is tested alone.
import { DateTime } from 'luxon';
import {
  checkInFieldsSchema,
  type CheckInFields,
  type CheckInRecord,
  type CylinderReading,
} from '@/shared/schemas/check-in';

export type CylinderChoice = 'unread' | 'full' | 'part' | 'weight';
export type CylinderDraft = { choice: CylinderChoice; amount: number | null };

export type CheckInDraft = {
  /** Local wall-clock time typed as "YYYY-MM-DD HH:MM"; blank means now. */
  time: string;
  socPct: number | null;
  cylinders: CylinderDraft[];
  harvestWh: number | null;
  note: string;
};

export function emptyDraft(cylinderCount: number): CheckInDraft {
  return {
    time: '',
    socPct: null,
    cylinders: Array.from({ length: cylinderCount }, () => ({ choice: 'unread', amount: null })),
    harvestWh: null,
    note: '',
  };
}

/** The form filled from a stored reading, its time shown in the offset it was taken in. */
export function draftFromRecord(record: CheckInRecord, cylinderCount: number): CheckInDraft {
  const draft = emptyDraft(cylinderCount);
  const t = DateTime.fromISO(record.checkIn.at, { setZone: true });
  for (const c of record.checkIn.propane) {
    const r = c.reading;
    draft.cylinders[c.tank] =
      r.kind === 'full'
        ? { choice: 'full', amount: null }
        : r.kind === 'fraction'
          ? { choice: 'part', amount: Math.round(r.share * 1000) / 10 }
          : { choice: 'weight', amount: r.kg };
  }
  return {
    ...draft,
    time: t.isValid ? t.toFormat('yyyy-LL-dd HH:mm') : '',
    socPct: record.checkIn.socPct,
    harvestWh: record.checkIn.harvestWh,
    note: record.checkIn.note,
  };
}

const TIME_MESSAGE = 'Write the time as 2027-09-14 18:00, or leave it blank for now.';

function cylinderReading(c: CylinderDraft, tank: number): CylinderReading | null {
  switch (c.choice) {
    case 'unread':
      return null;
    case 'full':
      return { tank, reading: { kind: 'full' } };
    case 'part':
      // People say "about half": the form takes a percentage, the API a share.
      return { tank, reading: { kind: 'fraction', share: c.amount === null ? Number.NaN : c.amount / 100 } };
    case 'weight':
      return { tank, reading: { kind: 'weight', kg: c.amount ?? Number.NaN } };
  }
}

export type DraftResult = { ok: true; fields: CheckInFields } | { ok: false; errors: Record<string, string> };

/** Fields for the API, or plain-language messages keyed by the form's field names. */
export function draftToFields(draft: CheckInDraft, zone: string): DraftResult {
  const errors: Record<string, string> = {};
  let at: string | undefined;
  if (draft.time.trim() !== '') {
    const t = DateTime.fromFormat(draft.time.trim(), 'yyyy-LL-dd HH:mm', { zone });
    if (t.isValid) at = t.toISO({ suppressMilliseconds: true, suppressSeconds: true }) ?? undefined;
    else errors.time = TIME_MESSAGE;
  }
  if (draft.socPct === null) errors.socPct = 'Enter the state of charge the battery monitor shows.';
  const propane = draft.cylinders.flatMap((c, i) => {
    const reading = cylinderReading(c, i);
    return reading ? [reading] : [];
  });
  const parsed = checkInFieldsSchema.safeParse({
    at,
    socPct: draft.socPct ?? 0,
    propane,
    harvestWh: draft.harvestWh,
    note: draft.note,
  });
  if (!parsed.success)
    for (const issue of parsed.error.issues) {
      const [first, index, , last] = issue.path;
      const key =
        first === 'propane' && typeof index === 'number'
          ? `cylinder${propane[index]?.tank ?? index}`
          : String(first ?? 'form');
      errors[key] ??=
        first === 'propane'
          ? last === 'share'
            ? 'Use a percentage from 0 to 100.'
            : 'Use a weight from 0 to 500 kg.'
          : issue.message;
    }
  return Object.keys(errors).length > 0 || !parsed.success ? { ok: false, errors } : { ok: true, fields: parsed.data };
}
