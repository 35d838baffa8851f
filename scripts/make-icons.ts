// Draws the app's home-screen icons (our own mark: a sun over a filled charge curve on pine) and writes them as PNGs
// into assets/icons/. Run by hand when the mark changes: `npx tsx scripts/make-icons.ts`; the PNGs are committed.
import fs from 'node:fs';
import path from 'node:path';
import { PNG } from 'pngjs';

type Rgb = readonly [number, number, number];
const PINE: Rgb = [0x2d, 0x6a, 0x4f];
const SUNLIT: Rgb = [0xf2, 0xb1, 0x34];
const DUNE: Rgb = [0xfc, 0xf6, 0xec];
const SAMPLES = 4; // per axis: 16 samples a pixel smooth the edges

/** The colour at a point of the unit square, or null outside the mark. `safe` shrinks the art for maskable icons. */
function colourAt(x: number, y: number, rounded: boolean, safe: number): Rgb | null {
  if (rounded) {
    const r = 0.2;
    const dx = Math.max(r - x, 0, x - (1 - r));
    const dy = Math.max(r - y, 0, y - (1 - r));
    if (dx * dx + dy * dy > r * r) return null;
  }
  // The art sits in the middle `safe` share of the square.
  const u = (x - 0.5) / safe + 0.5;
  const v = (y - 0.5) / safe + 0.5;
  // The charge curve: a filled hill that dips and recovers, as a day's state of charge does.
  const curve = 0.62 + 0.1 * Math.cos(u * Math.PI * 2) - 0.04 * Math.sin(u * Math.PI * 4);
  if (v > curve && v < 0.9 && u > 0.1 && u < 0.9) return DUNE;
  const sx = u - 0.66;
  const sy = v - 0.32;
  if (sx * sx + sy * sy < 0.15 * 0.15) return SUNLIT;
  return PINE;
}

function drawIcon(size: number, rounded: boolean, safe: number): Buffer {
  const png = new PNG({ width: size, height: size });
  for (let py = 0; py < size; py++)
    for (let px = 0; px < size; px++) {
      let r = 0;
      let g = 0;
      let b = 0;
      let a = 0;
      for (let sy = 0; sy < SAMPLES; sy++)
        for (let sx = 0; sx < SAMPLES; sx++) {
          const c = colourAt((px + (sx + 0.5) / SAMPLES) / size, (py + (sy + 0.5) / SAMPLES) / size, rounded, safe);
          if (!c) continue;
          r += c[0];
          g += c[1];
          b += c[2];
          a += 1;
        }
      const i = (py * size + px) * 4;
      png.data[i] = a ? Math.round(r / a) : 0;
      png.data[i + 1] = a ? Math.round(g / a) : 0;
      png.data[i + 2] = a ? Math.round(b / a) : 0;
      png.data[i + 3] = Math.round((a / (SAMPLES * SAMPLES)) * 255);
    }
  return PNG.sync.write(png);
}

const OUT = path.resolve(__dirname, '..', 'assets', 'icons');
fs.mkdirSync(OUT, { recursive: true });
const ICONS = [
  { file: 'icon-192.png', size: 192, rounded: true, safe: 1 },
  { file: 'icon-512.png', size: 512, rounded: true, safe: 1 },
  // Maskable: full bleed, the art inside the middle 80 % a launcher never crops.
  { file: 'icon-maskable-512.png', size: 512, rounded: false, safe: 0.8 },
  { file: 'apple-touch-icon.png', size: 180, rounded: false, safe: 0.9 },
];
for (const icon of ICONS) fs.writeFileSync(path.join(OUT, icon.file), drawIcon(icon.size, icon.rounded, icon.safe));
console.log(`Wrote ${ICONS.length} icons to ${OUT}`);
