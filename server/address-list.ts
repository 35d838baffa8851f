import { parse } from 'csv-parse/sync';
import { z } from 'zod';

/** A good address and the line it came from (the first, when it appears twice). */
export type Recipient = { email: string; name: string | null; line: number };
export type Rejected = { line: number; value: string; reason: string };

const email = z.email();
const NAMED = /^\s*"?([^"<]*?)"?\s*<([^>]+)>\s*$/;

function check(
  raw: string,
  name: string | null,
  line: number,
  accepted: Map<string, Recipient>,
  rejected: Rejected[],
): void {
  const address = raw.trim().toLowerCase();
  if (!email.safeParse(address).success) {
    rejected.push({ line, value: raw.trim(), reason: 'Not an e-mail address.' });
    return;
  }
  if (accepted.has(address)) return;
  accepted.set(address, { email: address, name: name?.trim() || null, line });
}

/** Pasted addresses: one per line or separated by commas or semicolons, optionally "Name <address>". */
export function parsePastedAddresses(text: string, accepted: Map<string, Recipient>, rejected: Rejected[]): void {
  text.split(/\r?\n/).forEach((lineText, index) => {
    for (const entry of lineText.split(/[,;]/)) {
      if (entry.trim() === '') continue;
      const named = NAMED.exec(entry);
      check(named?.[2] ?? entry, named?.[1] ?? null, index + 1, accepted, rejected);
    }
  });
}

/**
 * A CSV of households: a header naming the columns ("name", "email" in any order and case) or,
 * without one, name then e-mail. Rows are reported by their line in the file.
 */
export function parseCsvAddresses(text: string, accepted: Map<string, Recipient>, rejected: Rejected[]): void {
  let rows: string[][];
  try {
    rows = parse(text, { relax_column_count: true, skip_empty_lines: true, trim: true, bom: true }) as string[][];
  } catch (error) {
    rejected.push({
      line: 0,
      value: '',
      reason: `The CSV could not be read: ${error instanceof Error ? error.message : 'unknown error'}`,
    });
    return;
  }
  const header = (rows[0] ?? []).map((cell) => cell.toLowerCase());
  const hasHeader = header.some((cell) => cell.includes('mail'));
  const emailColumn = hasHeader ? header.findIndex((cell) => cell.includes('mail')) : 1;
  const nameColumn = hasHeader ? header.findIndex((cell) => cell.includes('name')) : 0;
  rows.slice(hasHeader ? 1 : 0).forEach((row, index) => {
    const line = index + (hasHeader ? 2 : 1);
    const value = row[emailColumn] ?? row.find((cell) => cell.includes('@')) ?? row.join(',');
    check(value, nameColumn >= 0 ? (row[nameColumn] ?? null) : null, line, accepted, rejected);
  });
}

export function parseRecipients(input: { addresses?: string; csv?: string }): {
  recipients: Recipient[];
  rejected: Rejected[];
  /** Which fields the good addresses came from, so a refusal can name the field. */
  sources: ('addresses' | 'csv')[];
} {
  const accepted = new Map<string, Recipient>();
  const rejected: Rejected[] = [];
  const sources: ('addresses' | 'csv')[] = [];
  if (input.addresses) parsePastedAddresses(input.addresses, accepted, rejected);
  if (accepted.size > 0) sources.push('addresses');
  const fromPaste = accepted.size;
  if (input.csv) parseCsvAddresses(input.csv, accepted, rejected);
  if (accepted.size > fromPaste) sources.push('csv');
  return { recipients: [...accepted.values()], rejected, sources };
}
