/** Set by Vite's `define` from package.json. */
declare const __APP_VERSION__: string;
