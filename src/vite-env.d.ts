/// <reference types="vite/client" />
/** The app's version from package.json, injected at build time by vite.config.ts. */
declare const __APP_VERSION__: string;
