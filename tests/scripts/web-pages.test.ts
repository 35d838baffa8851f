import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { keepServedPages, shellFrom } from '@/scripts/web-pages';

const HYDRATE = '<script type="module">globalThis.__EXPO_ROUTER_HYDRATE__=true;</script>';
const rendered = (screen: string) =>
  `<!DOCTYPE html><html><head><title data-rh="true"></title><meta charSet="utf-8"/><style id="react-native-stylesheet">.r-1{flex:1}</style>${HYDRATE}</head>` +
  `<body><div id="root"><div class="r-1">${screen}</div></div><script src="/_expo/static/js/web/entry-1.js" defer></script></body></html>`;

describe('the pages the export keeps', () => {
  it('when the shell is made from a rendered page, then its root is empty, the hydrate flag is gone and the head and scripts stay', () => {
    const shell = shellFrom(rendered('<input aria-label="Email"/>'));
    expect(shell).toContain('<div id="root"></div><script src="/_expo/static/js/web/entry-1.js" defer></script>');
    expect(shell).not.toContain('Email');
    expect(shell).not.toContain('__EXPO_ROUTER_HYDRATE__');
    expect(shell).toContain('<style id="react-native-stylesheet">');
  });

  it('when a page was not rendered (no hydrate flag), then making the shell stops the build', () => {
    expect(() => shellFrom(rendered('x').replace(HYDRATE, ''))).toThrow(/hydrate flag/);
  });

  it('when the export is done, then only the signed-out pages and the shell are left, and emptied folders go', () => {
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'trailtally-pages-'));
    for (const page of [
      'sign-in.html',
      'sign-up.html',
      'forgot-password.html',
      'index.html',
      '(app)/trips/[tripId].html',
    ]) {
      fs.mkdirSync(path.dirname(path.join(dir, page)), { recursive: true });
      fs.writeFileSync(path.join(dir, page), rendered(page));
    }
    fs.mkdirSync(path.join(dir, '_expo/static/js/web'), { recursive: true });
    fs.writeFileSync(path.join(dir, '_expo/static/js/web/entry-1.js'), '');

    const kept = keepServedPages(dir);

    expect(kept.sort()).toEqual(['forgot-password.html', 'index.html', 'shell.html', 'sign-in.html', 'sign-up.html']);
    expect(fs.existsSync(path.join(dir, '(app)'))).toBe(false);
    expect(fs.existsSync(path.join(dir, '_expo/static/js/web/entry-1.js'))).toBe(true);
    expect(fs.readFileSync(path.join(dir, 'shell.html'), 'utf8')).not.toContain('sign-in.html');
    // Until the app sets each screen's title, the tab names the app.
    expect(fs.readFileSync(path.join(dir, 'sign-up.html'), 'utf8')).toContain(
      '<title data-rh="true">Trailtally</title>',
    );
    fs.rmSync(dir, { recursive: true, force: true });
  });
});
