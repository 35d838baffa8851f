// An invite whose e-mail does not go out: the People tab says so at once, keeps the invite listed as
// "Not sent — retry", and Retry sends it once the mail server takes mail again. The mail server here is the
// test's own, on loopback, refusing every recipient until it is told to take them.
import type { AddressInfo } from 'node:net';
import { SMTPServer } from 'smtp-server';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_ACCOUNT } from '@/db/seed';
import { byTestId, openTrip, screenshot, signIn, trackPageErrors, useServerAndBrowser, VIEWPORTS } from './harness';

let takesMail = false;
const delivered: string[] = [];
const mailServer = new SMTPServer({
  authOptional: true,
  disabledCommands: ['AUTH', 'STARTTLS'],
  logger: false,
  onRcptTo(address, _session, callback) {
    if (!takesMail) {
      callback(Object.assign(new Error('Mailbox unavailable'), { responseCode: 550 }));
      return;
    }
    delivered.push(address.address);
    callback();
  },
  onData(stream, _session, callback) {
    stream.resume();
    stream.on('end', () => callback());
  },
});

beforeAll(async () => {
  await new Promise<void>((resolve) => mailServer.listen(0, '127.0.0.1', resolve));
});
afterAll(async () => {
  await new Promise<void>((resolve) => mailServer.close(() => resolve()));
});

// Started after the mail server above (hooks run in order), so its port is known.
const suite = useServerAndBrowser(() => ({
  SMTP_URL: `smtp://127.0.0.1:${(mailServer.server.address() as AddressInfo).port}`,
}));

describe('an invite whose mail does not go out', () => {
  it.each(Object.entries(VIEWPORTS))(
    'when the mail server refuses it at %s width, then the invite stays listed as not sent and Retry sends it',
    async (size, viewport) => {
      takesMail = false;
      const page = await (await suite.browser.newContext({ viewport })).newPage();
      const errors = trackPageErrors(page);
      await signIn(page, suite.server.url, DEMO_ACCOUNT.email, DEMO_ACCOUNT.password);
      await openTrip(page, 'Highland loop');
      await page.click(byTestId('tab-people'));
      await page.waitForSelector(byTestId('invite-form'));

      const email = `ailsa-${size}-${Date.now()}@example.test`;
      await page.fill(byTestId('invite-email'), email);
      await page.click(byTestId('invite-role-crew'));
      await page.click(byTestId('invite-submit'));
      // Answered at once with a plain message, and the form is free for the next address.
      await expect.poll(() => page.textContent(byTestId('invite-error'))).toMatch(/not sent|could not be sent/i);
      expect(await page.inputValue(byTestId('invite-email'))).toBe('');

      const row = page
        .locator(byTestId('pending-invites'))
        .locator('[data-testid^="invite-"]')
        .filter({ hasText: email })
        .first();
      await row.waitFor();
      const rowId = await row.getAttribute('data-testid');
      await page.waitForSelector(byTestId(`${rowId}-not-sent`));
      expect(await page.textContent(byTestId(`${rowId}-resend`))).toBe('Retry');
      await page.locator(byTestId(`${rowId}-not-sent`)).scrollIntoViewIfNeeded();
      await screenshot(page, `invite-not-sent-${size}`);
      expect(delivered).not.toContain(email);

      takesMail = true;
      await page.click(byTestId(`${rowId}-resend`));
      await page.getByText(`A new link went to ${email}.`).waitFor();
      await page.waitForSelector(byTestId(`${rowId}-not-sent`), { state: 'detached' });
      expect(delivered).toContain(email);
      expect(errors).toEqual([]);
      await page.context().close();
    },
  );
});
