// The app version and build id, set at build time by vite.config.ts (define); the fallbacks
// only apply to unit tests that import UI helpers outside a Vite build.
declare const __APP_VERSION__: string | undefined;
declare const __APP_BUILD__: string | undefined;

export const APP_VERSION: string = typeof __APP_VERSION__ === 'string' ? __APP_VERSION__ : '0.0.0-dev';
export const APP_BUILD: string = typeof __APP_BUILD__ === 'string' ? __APP_BUILD__ : 'dev';
