import fs from 'node:fs';
import path from 'node:path';
import { HYDRATE_FLAG_SCRIPT, PRERENDERED_PAGES, SHELL_FILE } from '../server/web-pages';
import { filesUnder } from './precompress-web';

/** The line the export puts in the head of a page it rendered, telling the app to adopt the markup (hydrate). */
const HYDRATE_FLAG = `<script type="module">${HYDRATE_FLAG_SCRIPT}</script>`;
const ROOT_OPEN = '<div id="root">';
/** The export leaves the title empty (each screen sets its own once the app runs); until then the tab names the app. */
const EMPTY_TITLE = '<title data-rh="true"></title>';

/**
 * The shell every other route loads: a rendered page with its drawn screen and the hydrate flag taken out, so the app
 * draws into an empty root. Its head (styles, fonts, scripts) stays as the export wrote it.
 */
export function shellFrom(renderedPage: string): string {
  if (!renderedPage.includes(HYDRATE_FLAG)) throw new Error('The exported page has no hydrate flag: was it rendered?');
  const open = renderedPage.indexOf(ROOT_OPEN);
  const scripts = renderedPage.indexOf('<script', open);
  const drawn = renderedPage.slice(open + ROOT_OPEN.length, scripts);
  if (open < 0 || scripts < 0 || !drawn.endsWith('</div>')) throw new Error('The exported page has no root to empty.');
  return renderedPage.slice(0, open).replace(HYDRATE_FLAG, '') + `${ROOT_OPEN}</div>` + renderedPage.slice(scripts);
}

/**
 * Keeps the pages the server sends (server/web-pages.ts): writes the shell from the sign-in page and removes every
 * other rendered page, whose first frame would depend on who asks. Returns the pages kept.
 */
export function keepServedPages(outDir: string): string[] {
  const signIn = PRERENDERED_PAGES['/sign-in'];
  if (!signIn) throw new Error('No sign-in page is listed as prerendered.');
  fs.writeFileSync(path.join(outDir, SHELL_FILE), shellFrom(fs.readFileSync(path.join(outDir, signIn), 'utf8')));
  const kept = new Set([SHELL_FILE, ...Object.values(PRERENDERED_PAGES)]);
  for (const file of filesUnder(outDir)) {
    if (!file.endsWith('.html')) continue;
    if (kept.has(path.relative(outDir, file).split(path.sep).join('/'))) {
      fs.writeFileSync(
        file,
        fs.readFileSync(file, 'utf8').replace(EMPTY_TITLE, '<title data-rh="true">Trailtally</title>'),
      );
    } else fs.rmSync(file);
  }
  removeEmptyFolders(outDir);
  return [...kept];
}

function removeEmptyFolders(dir: string): void {
  for (const entry of fs.readdirSync(dir, { withFileTypes: true })) {
    if (!entry.isDirectory()) continue;
    const full = path.join(dir, entry.name);
    removeEmptyFolders(full);
    if (fs.readdirSync(full).length === 0) fs.rmdirSync(full);
  }
}
