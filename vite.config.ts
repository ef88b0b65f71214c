import react from '@vitejs/plugin-react';
import { defineConfig, type Plugin } from 'vitest/config';

// Cross-origin isolation lets the page and its workers share memory (SharedArrayBuffer).
const isolation = {
  'Cross-Origin-Opener-Policy': 'same-origin',
  'Cross-Origin-Embedder-Policy': 'require-corp',
};

/**
 * The built app's Content-Security-Policy: its own scripts, workers, styles and data only; no
 * eval or new Function ('unsafe-eval' is absent), no inline script, no plugins, no framing of
 * forms. Images may be data: or blob: URLs (the picture export draws through them).
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
  "base-uri 'none'",
  "form-action 'none'",
].join('; ');

/** Puts the policy in the built index.html; the dev server needs inline scripts and goes without. */
function contentSecurityPolicy(): Plugin {
  return {
    name: 'conecast-content-security-policy',
    apply: 'build',
    transformIndexHtml: () => [
      {
        tag: 'meta',
        attrs: { 'http-equiv': 'Content-Security-Policy', content: CONTENT_SECURITY_POLICY },
        injectTo: 'head-prepend',
      },
    ],
  };
}

/** What a policy in a <meta> element cannot say: the built app may not be framed by other sites. */
const previewHeaders = { ...isolation, 'Content-Security-Policy': "frame-ancestors 'none'" };

export default defineConfig({
  root: 'app',
  publicDir: '../public',
  plugins: [react(), contentSecurityPolicy()],
  server: { headers: isolation },
  preview: { headers: previewHeaders },
  build: { outDir: '../dist', emptyOutDir: true, target: 'es2022' },
  worker: { format: 'es' },
  test: {
    root: '.',
    include: ['test/**/*.test.ts'],
    environment: 'node',
    testTimeout: 60_000,
  },
});
