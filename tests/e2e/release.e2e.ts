// A new release replaces the old one cleanly: the service worker is generated twice by the build's own step
// (`makeOffline`, Workbox over a dist folder) around a change, over a tiny fixture app rather than a full export, and
// served from a loopback server. The second worker takes over the open page, which says "updated — reload" through
// the app's own watcher, and a reload runs the new release from a precache holding only its files.
import fs from 'node:fs';
import type { AddressInfo } from 'node:net';
import os from 'node:os';
import path from 'node:path';
import express from 'express';
import type { Browser } from 'playwright-core';
import ts from 'typescript';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { makeOffline } from '@/scripts/web-offline';
import { launchBrowser } from './harness';

const UPDATED = 'Trailtally was updated — reload to use the new version.';
const WATCHER = path.resolve(__dirname, '..', '..', 'components', 'offline', 'watch-for-update.ts');

const page = (release: string) => `<!doctype html><html><head><title>Release ${release}</title></head><body>
<p id="release"></p><p id="banner"></p>
<script type="module">
  import { watchForUpdate } from '/watch-for-update.js';
  watchForUpdate(navigator.serviceWorker, () => { document.getElementById('banner').textContent = ${JSON.stringify(UPDATED)}; });
</script>
<script src="/release.js"></script>
</body></html>`;

function writeRelease(dir: string, release: string): void {
  fs.writeFileSync(path.join(dir, 'shell.html'), page(release));
  fs.writeFileSync(
    path.join(dir, 'release.js'),
    `window.RELEASE = ${JSON.stringify(release)}; document.getElementById('release').textContent = window.RELEASE;`,
  );
}

let browser: Browser;
let dist: string;
let server: ReturnType<ReturnType<typeof express>['listen']>;
let url: string;

beforeAll(async () => {
  dist = fs.mkdtempSync(path.join(os.tmpdir(), 'trailtally-release-'));
  // The watcher as the app ships it, turned into a module the fixture page can import.
  const watcher = ts.transpileModule(fs.readFileSync(WATCHER, 'utf8'), {
    compilerOptions: { module: ts.ModuleKind.ESNext, target: ts.ScriptTarget.ES2022 },
  });
  fs.writeFileSync(path.join(dist, 'watch-for-update.js'), watcher.outputText);
  const app = express();
  // As the real server does: the worker script is never cached, so the browser sees a new release.
  app.use(
    express.static(dist, {
      index: 'shell.html',
      setHeaders: (res, file) => {
        if (path.basename(file) === 'sw.js') res.setHeader('Cache-Control', 'no-cache');
      },
    }),
  );
  server = await new Promise((resolve) => {
    const listening = app.listen(0, '127.0.0.1', () => resolve(listening));
  });
  url = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  browser = await launchBrowser();
});

afterAll(async () => {
  await browser?.close();
  await new Promise((resolve) => server?.close(resolve));
  fs.rmSync(dist, { recursive: true, force: true });
});

describe('a new release', () => {
  it('when the app is built again with a change, then the new worker takes over, the page says "updated — reload" and a reload runs the new release', async () => {
    writeRelease(dist, 'one');
    await makeOffline(dist, ['shell.html']);
    const firstWorker = fs.readFileSync(path.join(dist, 'sw.js'), 'utf8');
    const context = await browser.newContext();
    const tab = await context.newPage();
    await tab.goto(url);
    await tab.waitForFunction(() => !!navigator.serviceWorker.controller);
    // A later visit, opened under the first release's worker: the page a traveller has open when a release lands.
    await tab.reload();
    await tab.waitForFunction(() => !!navigator.serviceWorker.controller);
    expect(await tab.textContent('#release')).toBe('one');
    expect(await tab.textContent('#banner')).toBe('');

    writeRelease(dist, 'two');
    await makeOffline(dist, ['shell.html']);
    expect(fs.readFileSync(path.join(dist, 'sw.js'), 'utf8')).not.toBe(firstWorker);
    // What the browser does on its own at the next navigation or within a day, asked for now.
    await tab.evaluate(async () => {
      await (await navigator.serviceWorker.getRegistration())?.update();
    });
    await tab.waitForFunction((text) => document.getElementById('banner')?.textContent === text, UPDATED);

    await tab.reload();
    await tab.waitForFunction(() => document.getElementById('release')?.textContent === 'two');
    // The old release's files left the precache: one copy of the script, the new one.
    const cached = await tab.evaluate(async () => {
      const bodies: Promise<string>[] = [];
      for (const name of await caches.keys()) {
        const cache = await caches.open(name);
        for (const request of await cache.keys())
          if (new URL(request.url).pathname === '/release.js')
            bodies.push((await cache.match(request))?.text() ?? Promise.resolve(''));
      }
      return Promise.all(bodies);
    });
    expect(cached).toHaveLength(1);
    expect(cached[0]).toContain('"two"');
    await context.close();
  });
});
