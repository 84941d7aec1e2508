// Renders the SVG icons in public/icons to the PNG sizes the web app manifest and iOS need,
// using the system Chromium (no image tool to install). Run after editing an SVG:
//   node scripts/make-icons.mjs
// The PNGs are committed; the build only copies them.
import { readFile } from 'node:fs/promises';
import { execSync } from 'node:child_process';
import { chromium } from 'playwright-core';

const dir = new URL('../public/icons/', import.meta.url);
const jobs = [
  { svg: 'icon.svg', png: 'icon-192.png', size: 192 },
  { svg: 'icon.svg', png: 'icon-512.png', size: 512 },
  { svg: 'icon-maskable.svg', png: 'icon-maskable-512.png', size: 512 },
  { svg: 'icon-maskable.svg', png: 'icon-maskable-192.png', size: 192 },
  // iOS rounds the corners itself and shows transparency as black: use the full-bleed variant.
  { svg: 'icon-maskable.svg', png: 'apple-touch-icon.png', size: 180 },
];

const executablePath =
  process.env.CHROME_PATH || execSync('command -v chromium', { encoding: 'utf8' }).trim();
const browser = await chromium.launch({
  executablePath,
  headless: true,
  args: ['--disable-gpu', '--disable-dev-shm-usage', '--disable-background-networking'],
});
try {
  for (const { svg, png, size } of jobs) {
    const page = await browser.newPage({ viewport: { width: size, height: size } });
    const markup = await readFile(new URL(svg, dir), 'utf8');
    await page.setContent(
      `<style>html,body{margin:0;background:transparent}svg{display:block;width:${size}px;height:${size}px}</style>${markup}`,
    );
    await page.screenshot({ path: new URL(png, dir).pathname, omitBackground: true });
    await page.close();
    console.log(`public/icons/${png} (${size}×${size})`);
  }
} finally {
  await browser.close();
}
