import { defineConfig, type Plugin } from 'vite';
import { VitePWA } from 'vite-plugin-pwa';
import { readFileSync } from 'node:fs';

/** The app's version, written into records it makes (walkdowns). */
const APP_VERSION = (JSON.parse(readFileSync('package.json', 'utf8')) as { version: string })
  .version;

/** Colour of the browser/OS chrome around the installed app; matches public/manifest.webmanifest. */
const THEME_COLOR = '#12324a';

/**
 * Adds the PWA head tags to index.html unless the page already has them, so the shell's
 * markup can stay about the app while the manifest, icons and theme colour stay in one place.
 */
function pwaHeadTags(): Plugin {
  return {
    name: 'tankside-pwa-head',
    transformIndexHtml(html) {
      const tags = [];
      if (!/rel=["']?manifest/.test(html)) {
        tags.push({ tag: 'link', attrs: { rel: 'manifest', href: '/manifest.webmanifest' } });
      }
      if (!/rel=["']?icon/.test(html)) {
        tags.push({
          tag: 'link',
          attrs: { rel: 'icon', href: '/icons/icon.svg', type: 'image/svg+xml' },
        });
      }
      if (!/rel=["']?apple-touch-icon/.test(html)) {
        tags.push({
          tag: 'link',
          attrs: { rel: 'apple-touch-icon', href: '/icons/apple-touch-icon.png' },
        });
      }
      if (!/name=["']?theme-color/.test(html)) {
        tags.push({ tag: 'meta', attrs: { name: 'theme-color', content: THEME_COLOR } });
      }
      return tags.map((t) => ({ ...t, injectTo: 'head' as const }));
    },
  };
}

export default defineConfig({
  // Relative imports use `.js` for `.ts` files; vite resolves them.
  build: {
    target: 'es2022',
    outDir: 'dist',
    emptyOutDir: true,
    sourcemap: false,
  },
  define: { __APP_VERSION__: JSON.stringify(APP_VERSION) },
  server: { host: '127.0.0.1' },
  preview: { host: '127.0.0.1', port: 4173, strictPort: true },
  plugins: [
    pwaHeadTags(),
    VitePWA({
      strategies: 'injectManifest',
      srcDir: 'sw',
      filename: 'sw.ts',
      // pwa/sw-register.ts registers the worker itself (workbox-window), and the manifest is a
      // plain file in public/, so the plugin only builds the worker and injects the precache list.
      injectRegister: false,
      manifest: false,
      injectManifest: {
        // Everything the app needs offline: code, styles, the shell, icons, the manifest.
        globPatterns: ['**/*.{js,css,html,svg,png,webmanifest,json,woff2}'],
        // The service worker itself is never precached (the plugin excludes it as well).
        globIgnores: ['sw.js'],
      },
      devOptions: { enabled: false },
    }),
  ],
});
