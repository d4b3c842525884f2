import { defineConfig, type Plugin } from 'vite';
import preact from '@preact/preset-vite';
import { VitePWA } from 'vite-plugin-pwa';
import pkg from './package.json' with { type: 'json' };
import { unitReaderOnDemand } from './build/unit-reader-on-demand.ts';
import { startSolverFirst } from './build/start-solver-first.ts';

// Colours of the daylight theme: a deep harbour blue on near-white, chosen for contrast in sun.
const themeColour = '#0b3d5c';
const backgroundColour = '#f7f9fb';

/**
 * Content-Security-Policy of the built app, as a <meta> (the app is served as static files, often by hosts that
 * set no headers). Everything comes from our own origin: scripts, module workers, styles, the service worker;
 * images may also be data: or blob: URLs (QR codes, site photos). No inline script and no eval. Styles set by
 * script go through the CSSOM, which style-src does not govern, so no 'unsafe-inline' is needed.
 * Only the production build carries it: the dev server's hot reload needs inline script and a websocket.
 */
export const CONTENT_SECURITY_POLICY = [
  "default-src 'self'",
  "script-src 'self'",
  "worker-src 'self'",
  "style-src 'self'",
  "img-src 'self' data: blob:",
  "connect-src 'self'",
  "font-src 'self'",
  "object-src 'none'",
  "base-uri 'self'",
  "form-action 'self'",
].join('; ');

function contentSecurityPolicy(): Plugin {
  return {
    name: 'wetmode-content-security-policy',
    apply: 'build',
    transformIndexHtml: () => [{ tag: 'meta', attrs: { 'http-equiv': 'Content-Security-Policy', content: CONTENT_SECURITY_POLICY }, injectTo: 'head-prepend' }],
  };
}

export default defineConfig({
  define: {
    // WETMODE_BUILD_STAMP marks a build apart from another of the same version (used by the update test).
    __APP_VERSION__: JSON.stringify(pkg.version + (process.env.WETMODE_BUILD_STAMP ? `+${process.env.WETMODE_BUILD_STAMP}` : '')),
  },
  plugins: [
    contentSecurityPolicy(),
    unitReaderOnDemand(),
    startSolverFirst(),
    preact(),
    VitePWA({
      // The update waits for the user (see src/ui/shell/UpdatePrompt.tsx); the app imports the register module itself.
      registerType: 'prompt',
      injectRegister: false,
      includeAssets: ['icons/wetmode.svg', 'icons/apple-touch-icon.png'],
      manifest: {
        name: 'Wetmode — wet and dry natural frequencies',
        short_name: 'Wetmode',
        description: 'Field screening of dry and wet natural frequencies of members in liquid, with resonance margins.',
        theme_color: themeColour,
        background_color: backgroundColour,
        display: 'standalone',
        orientation: 'any',
        start_url: './',
        scope: './',
        icons: [
          { src: 'icons/wetmode.svg', sizes: 'any', type: 'image/svg+xml', purpose: 'any' },
          { src: 'icons/wetmode-192.png', sizes: '192x192', type: 'image/png', purpose: 'any' },
          { src: 'icons/wetmode-512.png', sizes: '512x512', type: 'image/png', purpose: 'any' },
          { src: 'icons/wetmode-maskable-512.png', sizes: '512x512', type: 'image/png', purpose: 'maskable' },
        ],
      },
      workbox: {
        // The whole app shell, worker chunks included, so a reload with no signal still works.
        globPatterns: ['**/*.{js,css,html,svg,png,webmanifest,woff2}'],
        navigateFallback: 'index.html',
        cleanupOutdatedCaches: true,
        maximumFileSizeToCacheInBytes: 4 * 1024 * 1024,
      },
    }),
  ],
  worker: { format: 'es' },
  build: { target: 'es2022', sourcemap: false, outDir: 'dist', emptyOutDir: true },
  preview: { port: 4173, strictPort: true },
});
