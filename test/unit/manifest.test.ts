import { readFileSync, existsSync } from 'node:fs';
import { describe, expect, it } from 'vitest';

const publicDir = new URL('../../public/', import.meta.url);

interface ManifestIcon {
  src: string;
  sizes: string;
  type: string;
  purpose?: string;
}
const manifest = JSON.parse(readFileSync(new URL('manifest.webmanifest', publicDir), 'utf8')) as {
  name: string;
  short_name: string;
  start_url: string;
  scope: string;
  display: string;
  theme_color: string;
  background_color: string;
  icons: ManifestIcon[];
};

/** Width and height from a PNG's IHDR chunk (bytes 16–23, big-endian). */
function pngSize(path: URL): { width: number; height: number } {
  const b = readFileSync(path);
  expect(b.subarray(1, 4).toString('latin1'), `${path.pathname} is a PNG`).toBe('PNG');
  return { width: b.readUInt32BE(16), height: b.readUInt32BE(20) };
}

function publicFile(src: string): URL {
  return new URL(src.replace(/^\//, ''), publicDir);
}

describe('web app manifest', () => {
  it('manifest names the app and opens standalone inside its own scope', () => {
    expect(manifest.name).toMatch(/Tankside/);
    expect(manifest.short_name.length).toBeLessThanOrEqual(12); // fits under a home-screen icon
    expect(manifest.display).toBe('standalone');
    const scope = new URL(manifest.scope, 'https://app.invalid/');
    const start = new URL(manifest.start_url, 'https://app.invalid/');
    expect(start.pathname.startsWith(scope.pathname)).toBe(true);
    expect(manifest.theme_color).toMatch(/^#[0-9a-f]{6}$/i);
    expect(manifest.background_color).toMatch(/^#[0-9a-f]{6}$/i);
  });

  it('manifest icons exist, and each PNG has the size it claims', () => {
    for (const icon of manifest.icons) {
      const file = publicFile(icon.src);
      expect(existsSync(file), `${icon.src} exists`).toBe(true);
      if (icon.type !== 'image/png') continue;
      const [w, h] = icon.sizes.split('x').map(Number);
      expect(pngSize(file), icon.src).toEqual({ width: w, height: h });
    }
  });

  it('manifest offers 192 and 512 px PNGs for any purpose and a maskable one', () => {
    const png = manifest.icons.filter((i) => i.type === 'image/png');
    const any = png
      .filter((i) => (i.purpose ?? 'any').split(' ').includes('any'))
      .map((i) => i.sizes);
    expect(any).toEqual(expect.arrayContaining(['192x192', '512x512']));
    expect(png.some((i) => i.purpose?.split(' ').includes('maskable'))).toBe(true);
  });

  it('the apple-touch-icon linked by the build is a 180 px PNG', () => {
    expect(pngSize(publicFile('/icons/apple-touch-icon.png'))).toEqual({ width: 180, height: 180 });
  });
});
