/// <reference types="vitest/config" />
import { defineConfig, type Plugin } from 'vite';
import react from '@vitejs/plugin-react';
import { VitePWA } from 'vite-plugin-pwa';
import { fileURLToPath, URL } from 'node:url';
import { readFileSync } from 'node:fs';
import { CONTENT_SECURITY_POLICY_META } from './src/cli/serve/content-security-policy';

const pkg = JSON.parse(readFileSync(new URL('./package.json', import.meta.url), 'utf8')) as {
  version: string;
};

const projectRoot = fileURLToPath(new URL('.', import.meta.url));

/**
 * Put the policy (src/cli/serve/content-security-policy.ts) into index.html as the first element of <head> at build time only: the dev server
 * needs an inline script (React Fast Refresh), which the policy rightly forbids.
 */
function contentSecurityPolicy(): Plugin {
  return {
    name: 'saltsmith-content-security-policy',
    apply: 'build',
    transformIndexHtml: {
      order: 'post',
      handler: () => [
        {
          tag: 'meta',
          attrs: { 'http-equiv': 'Content-Security-Policy', content: CONTENT_SECURITY_POLICY_META },
          injectTo: 'head-prepend',
        },
      ],
    },
  };
}

export default defineConfig({
  // index.html lives in src/ so the top level keeps only the designed entries.
  root: 'src',
  publicDir: '../public',
  define: {
    __APP_VERSION__: JSON.stringify(pkg.version),
  },
  resolve: {
    alias: { '@': fileURLToPath(new URL('./src', import.meta.url)) },
  },
  plugins: [
    react(),
    contentSecurityPolicy(),
    // Offline (README "Offline"): precache the whole app so it opens and works with no network after
    // one visit. The manifest is public/manifest.webmanifest (our own); registration is in
    // src/app/register-sw.ts. Every .js is precached: openchemlib's lazy chunk (structure parsing)
    // and the Monte Carlo worker included. openchemlib's ~1.35 MB predictor resources JSON is left
    // out: no predictor needing it runs in the app.
    VitePWA({
      registerType: 'autoUpdate',
      injectRegister: false,
      manifest: false,
      workbox: {
        globPatterns: ['**/*.{js,mjs,css,html,svg,png,webmanifest,json,wasm}'],
        globIgnores: ['**/resources*.json'],
        maximumFileSizeToCacheInBytes: 4 * 1024 * 1024,
        navigateFallback: 'index.html',
        cleanupOutdatedCaches: true,
        clientsClaim: true,
        skipWaiting: true,
      },
    }),
  ],
  worker: { format: 'es' },
  build: { target: 'es2022', outDir: '../dist', emptyOutDir: true, chunkSizeWarningLimit: 1500 },
  test: {
    root: projectRoot,
    globals: false,
    setupFiles: ['tests/setup-tests.ts'],
    testTimeout: 20000,
    projects: [
      {
        extends: true,
        test: {
          name: 'core',
          environment: 'node',
          include: ['tests/chem/**/*.test.ts', 'tests/cli/**/*.test.ts', 'tests/arch/**/*.test.ts'],
        },
      },
      {
        extends: true,
        test: {
          name: 'ui',
          environment: 'jsdom',
          include: ['tests/**/*.test.{ts,tsx}'],
          exclude: ['tests/chem/**', 'tests/cli/**', 'tests/arch/**', 'tests/e2e/**'],
        },
      },
    ],
  },
});
