import fs from 'node:fs';
import path from 'node:path';
import { filesUnder } from './precompress-web';

/**
 * Nunito's weights the app draws with, and the local face the browser shows until each arrives. The fallback is
 * Arial (or its metric twin Liberation Sans) scaled so a line of the app's text takes the width it will take in
 * Nunito, with Nunito's ascent and descent, so swapping the font in moves nothing by more than a pixel or two.
 * Widths: the advance widths of a sample of the app's text in each font's hmtx table (Nunito 3.x from
 * @expo-google-fonts/nunito; Liberation Sans 2.x), measured for this file.
 */
export const NUNITO_FACES = [
  { family: 'Nunito_400Regular', weight: 400, local: ['Arial', 'Liberation Sans'], sizeAdjust: 1.022 },
  { family: 'Nunito_600SemiBold', weight: 600, local: ['Arial Bold', 'Liberation Sans Bold'], sizeAdjust: 0.967 },
  { family: 'Nunito_700Bold', weight: 700, local: ['Arial Bold', 'Liberation Sans Bold'], sizeAdjust: 0.987 },
  { family: 'Nunito_800ExtraBold', weight: 800, local: ['Arial Bold', 'Liberation Sans Bold'], sizeAdjust: 1.009 },
] as const;
/** Nunito's vertical metrics (hhea, units of the em). */
const NUNITO_ASCENT = 1.011;
const NUNITO_DESCENT = 0.353;

const percent = (value: number): string => `${(value * 100).toFixed(1)}%`;

/** The fallback family the app names after each Nunito weight (components/theme/tokens.ts). */
export const fallbackFamily = (family: string): string => `${family} Fallback`;

/**
 * What goes in the page's <head> so text paints at once: a preload for each weight (requested with the page, not
 * after the app's script), @font-face rules that swap Nunito in when it arrives, and the metric-matched fallbacks.
 */
export function fontHead(urls: Record<string, string>): string {
  const links: string[] = [];
  const rules: string[] = [];
  for (const face of NUNITO_FACES) {
    const url = urls[face.family];
    if (!url) throw new Error(`No font file for ${face.family}`);
    links.push(`<link rel="preload" href="${url}" as="font" type="font/ttf" crossorigin>`);
    rules.push(
      `@font-face{font-family:"${face.family}";src:url("${url}") format("truetype");font-display:swap}`,
      `@font-face{font-family:"${fallbackFamily(face.family)}";src:${face.local.map((name) => `local("${name}")`).join(',')};` +
        `size-adjust:${percent(face.sizeAdjust)};ascent-override:${percent(NUNITO_ASCENT / face.sizeAdjust)};` +
        `descent-override:${percent(NUNITO_DESCENT / face.sizeAdjust)};line-gap-override:0%}`,
    );
  }
  return `${links.join('\n')}\n<style id="nunito-faces">${rules.join('\n')}</style>\n`;
}

/** Where the preloads go: first in the head, right after the character set, so they are requested at once. */
const CHARSET = /<meta charset="utf-8"\s*\/?>/i;

/** Writes the fonts' preloads and faces into each exported page, naming the hashed font files the export wrote. */
export function addFontsToPages(outDir: string, pages: readonly string[]): void {
  const urls: Record<string, string> = {};
  for (const file of filesUnder(path.join(outDir, 'assets'))) {
    const face = NUNITO_FACES.find((f) => path.basename(file).startsWith(`${f.family}.`) && file.endsWith('.ttf'));
    if (face) urls[face.family] = `/${path.relative(outDir, file).split(path.sep).join('/')}`;
  }
  for (const page of pages) {
    const pagePath = path.join(outDir, page);
    const html = fs.readFileSync(pagePath, 'utf8');
    if (html.includes('id="nunito-faces"')) continue;
    if (!CHARSET.test(html)) throw new Error(`${page} has no character set to put the fonts after.`);
    fs.writeFileSync(
      pagePath,
      html.replace(CHARSET, (charset) => `${charset}\n${fontHead(urls)}`),
    );
  }
}
