import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { makeOffline } from '@/scripts/web-offline';

describe('the service worker the build writes', () => {
  it('when files carry a hash in their names, then the worker may take them from the browser cache; the shell is always fetched anew', async () => {
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'trailtally-offline-'));
    const write = (file: string, text: string) => {
      fs.mkdirSync(path.dirname(path.join(dir, file)), { recursive: true });
      fs.writeFileSync(path.join(dir, file), text);
    };
    write('shell.html', '<html><head></head><body></body></html>');
    write('sign-in.html', '<html><head></head><body><form></form></body></html>');
    write('_expo/static/js/web/entry-0123abcd.js', 'console.log(1);');
    write('assets/fonts/Nunito.0123abcd.ttf', 'font');

    await makeOffline(dir, ['shell.html', 'sign-in.html']);
    const worker = fs.readFileSync(path.join(dir, 'sw.js'), 'utf8');

    expect(worker).toMatch(/url:"_expo\/static\/js\/web\/entry-0123abcd\.js",revision:null/);
    expect(worker).toMatch(/url:"assets\/fonts\/Nunito\.0123abcd\.ttf",revision:null/);
    expect(worker).toMatch(/url:"shell\.html",revision:"[0-9a-f]+"/);
    // The signed-out pages prerendered for a first visit are not kept offline: every route offline loads the shell.
    expect(worker).not.toContain('sign-in.html');
    expect(fs.readFileSync(path.join(dir, 'sign-in.html'), 'utf8')).toContain('rel="manifest"');
    fs.rmSync(dir, { recursive: true, force: true });
  });
});
