import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { addFontsToPages, NUNITO_FACES } from '@/scripts/web-fonts';

function exportWithFonts(): string {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'trailtally-fonts-'));
  fs.writeFileSync(
    path.join(dir, 'index.html'),
    '<html><head><meta charSet="utf-8"/><title>Trailtally</title></head><body></body></html>',
  );
  for (const { family } of NUNITO_FACES) {
    const folder = path.join(dir, 'assets/__main/node_modules/@expo-google-fonts/nunito', family.split('_')[1] ?? '');
    fs.mkdirSync(folder, { recursive: true });
    fs.writeFileSync(path.join(folder, `${family}.0123abcd.ttf`), 'font');
  }
  return dir;
}

describe('fonts in the page shell', () => {
  it('when the export is finished, then index.html preloads every Nunito weight by its hashed file, with swap', () => {
    const dir = exportWithFonts();
    addFontsToPages(dir, ['index.html']);
    const shell = fs.readFileSync(path.join(dir, 'index.html'), 'utf8');
    for (const { family } of NUNITO_FACES) {
      const url = `/assets/__main/node_modules/@expo-google-fonts/nunito/${family.split('_')[1]}/${family}.0123abcd.ttf`;
      expect(shell).toContain(`<link rel="preload" href="${url}" as="font" type="font/ttf" crossorigin>`);
      expect(shell).toContain(
        `@font-face{font-family:"${family}";src:url("${url}") format("truetype");font-display:swap}`,
      );
      expect(shell).toContain(`font-family:"${family} Fallback";src:local(`);
    }
    // First in the head, right after the character set: requested before the page's styles and scripts.
    expect(shell.indexOf('rel="preload"')).toBeGreaterThan(shell.indexOf('charSet'));
    expect(shell.indexOf('rel="preload"')).toBeLessThan(shell.indexOf('<title>'));
    fs.rmSync(dir, { recursive: true, force: true });
  });

  it('when the shell already has the faces, then running again adds nothing', () => {
    const dir = exportWithFonts();
    addFontsToPages(dir, ['index.html']);
    const once = fs.readFileSync(path.join(dir, 'index.html'), 'utf8');
    addFontsToPages(dir, ['index.html']);
    expect(fs.readFileSync(path.join(dir, 'index.html'), 'utf8')).toBe(once);
    fs.rmSync(dir, { recursive: true, force: true });
  });

  it('when a weight is missing from the export, then the build stops and names it', () => {
    const dir = exportWithFonts();
    fs.rmSync(path.join(dir, 'assets/__main/node_modules/@expo-google-fonts/nunito/700Bold'), { recursive: true });
    expect(() => addFontsToPages(dir, ['index.html'])).toThrow(/Nunito_700Bold/);
    fs.rmSync(dir, { recursive: true, force: true });
  });
});
