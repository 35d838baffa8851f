import crypto from 'node:crypto';
import fs from 'node:fs';
import type http from 'node:http';
import os from 'node:os';
import path from 'node:path';
import zlib from 'node:zlib';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { precompressDir } from '@/scripts/precompress-web';
import { pickEncoding } from '@/server/accept-encoding';
import { listen, rawGet } from '../factories/raw-get';
import { createTestApp, type TestContext } from '../factories/test-app';

// A script big enough to be worth compressing, and text the middleware would squeeze on the fly if it ran.
const SCRIPT = `console.log(${JSON.stringify('trailtally '.repeat(2000))});\n`;
const SIGN_IN_PAGE = '<!doctype html><title>Trailtally</title><div id="root"><form>Sign in</form></div>';
const WASM = Buffer.concat([Buffer.from([0, 0x61, 0x73, 0x6d, 1, 0, 0, 0]), Buffer.alloc(4096, 7)]);

describe('static web files', () => {
  let dir: string;
  let ctx: TestContext;
  let server: http.Server;
  const script = '/_expo/static/js/web/entry-abc123.js';
  const wasm = '/_expo/static/wasm/canvaskit-0123456789abcdef.wasm';

  beforeAll(async () => {
    dir = fs.mkdtempSync(path.join(os.tmpdir(), 'trailtally-web-'));
    fs.writeFileSync(path.join(dir, 'shell.html'), '<!doctype html><title>Trailtally</title>');
    fs.writeFileSync(path.join(dir, 'sign-in.html'), SIGN_IN_PAGE);
    fs.mkdirSync(path.join(dir, '_expo/static/js/web'), { recursive: true });
    fs.mkdirSync(path.join(dir, '_expo/static/wasm'), { recursive: true });
    fs.writeFileSync(path.join(dir, script), SCRIPT);
    fs.writeFileSync(path.join(dir, wasm), WASM);
    fs.writeFileSync(path.join(dir, 'unlisted.txt'), 'plain '.repeat(400));
    await precompressDir(dir);
    ctx = createTestApp({ webDir: dir });
    server = await listen(ctx.app);
  });
  afterAll(async () => {
    await new Promise((resolve) => server.close(resolve));
    ctx.close();
    fs.rmSync(dir, { recursive: true, force: true });
  });

  it('when the build runs, then every script and the wasm get a Brotli and a gzip copy that decode to the original', () => {
    expect(zlib.brotliDecompressSync(fs.readFileSync(path.join(dir, `${script}.br`))).toString()).toBe(SCRIPT);
    expect(zlib.gunzipSync(fs.readFileSync(path.join(dir, `${script}.gz`))).toString()).toBe(SCRIPT);
    expect(zlib.brotliDecompressSync(fs.readFileSync(path.join(dir, `${wasm}.br`)))).toEqual(WASM);
    expect(fs.existsSync(path.join(dir, 'shell.html.br'))).toBe(false);
  });

  it('when a browser accepts Brotli, then the build-time Brotli bytes go out with the script type and their length', async () => {
    const res = await rawGet(server, script, { 'Accept-Encoding': 'gzip, deflate, br, zstd' });
    expect(res.status).toBe(200);
    expect(res.headers['content-encoding']).toBe('br');
    expect(res.headers['content-type']).toMatch(/^text\/javascript/);
    expect(res.headers.vary).toMatch(/Accept-Encoding/);
    expect(res.headers['cache-control']).toBe('public, max-age=31536000, immutable');
    const sent = res.body;
    expect(sent.equals(fs.readFileSync(path.join(dir, `${script}.br`)))).toBe(true);
    expect(Number(res.headers['content-length'])).toBe(sent.length);
  });

  it('when a client accepts only gzip, then the gzip copy is sent', async () => {
    const res = await rawGet(server, script, { 'Accept-Encoding': 'gzip' });
    expect(res.headers['content-encoding']).toBe('gzip');
    expect(res.body.equals(fs.readFileSync(path.join(dir, `${script}.gz`)))).toBe(true);
  });

  it('when a client accepts no ready-made encoding, then the original goes out uncompressed (not deflated on the fly)', async () => {
    const res = await rawGet(server, script, { 'Accept-Encoding': 'deflate' });
    expect(res.headers['content-encoding']).toBeUndefined();
    expect(res.body.toString()).toBe(SCRIPT);
    expect(Number(res.headers['content-length'])).toBe(Buffer.byteLength(SCRIPT));
  });

  it('when the hashed wasm is asked for, then it is WebAssembly, compressed and cached for a year', async () => {
    const res = await rawGet(server, wasm, { 'Accept-Encoding': 'br' });
    expect(res.headers['content-type']).toBe('application/wasm');
    expect(res.headers['content-encoding']).toBe('br');
    expect(res.headers['cache-control']).toBe('public, max-age=31536000, immutable');
  });

  it('when the same file is asked for again with its ETag, then the answer is 304 without a body', async () => {
    const first = await request(ctx.app).get(script).set('Accept-Encoding', 'br');
    const again = await request(ctx.app)
      .get(script)
      .set('Accept-Encoding', 'br')
      .set('If-None-Match', String(first.headers.etag));
    expect(again.status).toBe(304);
  });

  it('when an unknown path or the app shell is asked for, then the shell answers with no-cache', async () => {
    const res = await request(ctx.app).get('/trips/abc').set('Accept-Encoding', 'br');
    expect(res.status).toBe(200);
    expect(res.headers['cache-control']).toBe('no-cache');
    expect(res.text).toBe('<!doctype html><title>Trailtally</title>');
  });

  it('when a visitor with no session cookie opens the sign-in page, then its prerendered page answers', async () => {
    const res = await request(ctx.app).get('/sign-in').set('Cookie', 'theme=light');
    expect(res.status).toBe(200);
    expect(res.text).toBe(SIGN_IN_PAGE);
    expect(res.headers.vary).toMatch(/Cookie/);
  });

  it('when a visitor with a session cookie opens the sign-in page, then the shell answers (no sign-in form flashes)', async () => {
    for (const cookie of ['better-auth.session_token=abc.def', '__Secure-better-auth.session_token=abc.def']) {
      const res = await request(ctx.app).get('/sign-in').set('Cookie', `theme=light; ${cookie}`);
      expect(res.text).toBe('<!doctype html><title>Trailtally</title>');
    }
  });

  it('when a page is served, then its content security policy allows the export hydrate flag as its one inline script', async () => {
    // The exact line Expo Router's static export writes into a rendered page's head.
    const flag = 'globalThis.__EXPO_ROUTER_HYDRATE__=true;';
    const hash = crypto.createHash('sha256').update(flag).digest('base64');
    const res = await request(ctx.app).get('/sign-in');
    const scriptSrc = /script-src ([^;]*)/.exec(String(res.headers['content-security-policy']))?.[1] ?? '';
    expect(scriptSrc.split(' ')).toEqual(["'self'", "'wasm-unsafe-eval'", `'sha256-${hash}'`]);
  });

  it('when a page without a prerendered copy is opened signed out, then the shell answers', async () => {
    const res = await request(ctx.app).get('/trips');
    expect(res.text).toBe('<!doctype html><title>Trailtally</title>');
  });

  it('when a path tries to leave the folder, then it gets the app shell, not a file outside', async () => {
    const res = await request(ctx.app).get('/_expo/..%2f..%2fetc%2fpasswd').set('Accept-Encoding', 'br');
    expect(res.text).toContain('<title>Trailtally</title>');
  });
});

describe('pickEncoding', () => {
  it('when a client rates Brotli and gzip alike, then Brotli (the smaller) is chosen whatever their order', () => {
    expect(pickEncoding('gzip, deflate, br', ['br', 'gzip'])).toBe('br');
  });
  it('when a client rates gzip higher or refuses Brotli, then gzip is chosen', () => {
    expect(pickEncoding('br;q=0.5, gzip', ['br', 'gzip'])).toBe('gzip');
    expect(pickEncoding('br;q=0, *', ['br', 'gzip'])).toBe('gzip');
  });
  it('when a client sends no Accept-Encoding or only identity, then nothing is chosen', () => {
    expect(pickEncoding(undefined, ['br', 'gzip'])).toBeUndefined();
    expect(pickEncoding('identity', ['br', 'gzip'])).toBeUndefined();
  });
});
