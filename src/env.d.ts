/// <reference types="vite/client" />
/// <reference types="vite-plugin-pwa/preact" />
/** Set by Vite's `define` from package.json. */
declare const __APP_VERSION__: string;
