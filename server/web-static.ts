import fs from 'node:fs';
import path from 'node:path';
import { getSessionCookie } from 'better-auth/cookies';
import express from 'express';
import type { Request, Response, Router } from 'express';
import { pickEncoding, type EncodingName } from './accept-encoding';
import { PRERENDERED_PAGES, SHELL_FILE } from './web-pages';

/** Ready-made compressed copies the build writes beside a file, best first (Brotli is the smaller). */
const ENCODINGS: readonly { name: EncodingName; suffix: string }[] = [
  { name: 'br', suffix: '.br' },
  { name: 'gzip', suffix: '.gz' },
];

const isHashed = (urlPath: string): boolean => urlPath.startsWith('/_expo/') || urlPath.startsWith('/assets/');

function setCaching(res: Response, hashed: boolean): void {
  res.setHeader('Cache-Control', hashed ? 'public, max-age=31536000, immutable' : 'no-cache');
}

/** Every file under `root` that has compressed copies beside it, by its URL path, with the encodings it has. */
function findPrecompressed(root: string): Map<string, EncodingName[]> {
  const found = new Map<string, EncodingName[]>();
  const walk = (dir: string): void => {
    for (const entry of fs.readdirSync(dir, { withFileTypes: true })) {
      const full = path.join(dir, entry.name);
      if (entry.isDirectory()) walk(full);
      else if (!ENCODINGS.some((e) => entry.name.endsWith(e.suffix))) {
        const encodings = ENCODINGS.filter((e) => fs.existsSync(full + e.suffix)).map((e) => e.name);
        if (encodings.length > 0) found.set(`/${path.relative(root, full).split(path.sep).join('/')}`, encodings);
      }
    }
  };
  walk(root);
  return found;
}

/**
 * The page a request for `urlPath` gets: a signed-out page with its screen already drawn when the visitor has no
 * session cookie (nobody without one can be signed in), else the shell. A visitor with a cookie always gets the shell,
 * so nobody signed in sees the sign-in form for a moment, even if the cookie has expired.
 */
function pageFile(req: Request, urlPath: string): string {
  const prerendered = PRERENDERED_PAGES[urlPath];
  if (!prerendered) return SHELL_FILE;
  const cookies = new Headers();
  if (req.headers.cookie) cookies.set('cookie', req.headers.cookie);
  return getSessionCookie(cookies) ? SHELL_FILE : prerendered;
}

/**
 * Serves the exported web app: hashed assets with a long cache, and a page for every other GET that is not an API
 * call, so deep links like /trips/abc load the app (see `pageFile` for which page). Scripts, fonts and the wasm go out
 * as the Brotli or gzip copy the build wrote (never compressed per request); `res.locals.precompressed` tells the
 * app's compression middleware to leave them alone.
 */
export function webStatic(webDir: string): Router | undefined {
  const root = path.resolve(webDir);
  if (!fs.existsSync(path.join(root, SHELL_FILE))) return undefined;
  const precompressed = findPrecompressed(root);
  const router = express.Router();
  router.use((req, res, next) => {
    if (req.method !== 'GET' && req.method !== 'HEAD') return next();
    let urlPath: string;
    try {
      urlPath = decodeURIComponent(req.path);
    } catch {
      return next();
    }
    // Only paths found on disk at start are looked up: nothing in the URL can reach outside the folder.
    const encodings = precompressed.get(urlPath);
    if (!encodings) return next();
    const encoding = pickEncoding(req.headers['accept-encoding'], encodings);
    const suffix = ENCODINGS.find((e) => e.name === encoding)?.suffix ?? '';
    res.locals.precompressed = true;
    res.setHeader('Vary', 'Accept-Encoding');
    if (encoding) res.setHeader('Content-Encoding', encoding);
    // The type of the original file, not of its .br or .gz copy.
    res.type(path.extname(urlPath));
    setCaching(res, isHashed(urlPath));
    res.sendFile(
      path.join(root, urlPath + suffix),
      { acceptRanges: false, cacheControl: false, dotfiles: 'allow' },
      (error) => {
        if (error) next(error);
      },
    );
  });
  router.use(
    express.static(root, {
      index: false,
      setHeaders(res, filePath) {
        setCaching(res, isHashed(`/${path.relative(root, filePath).split(path.sep).join('/')}`));
      },
    }),
  );
  router.get(/^(?!\/api(\/|$)).*/, (req, res, next) => {
    res.setHeader('Cache-Control', 'no-cache');
    // The same address answers with either page, depending on the cookie.
    res.setHeader('Vary', 'Cookie');
    res.sendFile(path.join(root, pageFile(req, req.path)), (error) => {
      if (error) next(error);
    });
  });
  return router;
}
