// Build and dev server of the web client (apps/web). The API runs as its own process;
// in development its routes under /api are proxied so the client keeps a single origin.
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import tailwindcss from '@tailwindcss/vite';
import react from '@vitejs/plugin-react';
import { defineConfig } from 'vite';

const repoRoot = fileURLToPath(new URL('.', import.meta.url));
const apiPort = process.env.API_PORT ?? 3000;

export default defineConfig({
  root: path.resolve(repoRoot, 'apps/web'),
  plugins: [react(), tailwindcss()],
  build: {
    outDir: path.resolve(repoRoot, 'dist/web'),
    emptyOutDir: true,
    // Fonts and images stay files: the CSP allows fonts from this origin only, not data: URIs.
    assetsInlineLimit: 0,
    rolldownOptions: {
      output: {
        codeSplitting: {
          groups: [
            // Every page needs these; kept apart from app code so a release that changes only
            // the app leaves this chunk in the browser's cache.
            {
              name: 'framework',
              test: /[\\/]node_modules[\\/](react|react-dom|scheduler|react-router|react-router-dom|@tanstack[\\/](react-query|query-core))[\\/]/,
            },
          ],
        },
      },
    },
  },
  server: {
    // The Host header stays the dev server's, so the API's same-origin checks and OAuth redirects
    // see the address the browser uses.
    proxy: {
      '/api': { target: `http://127.0.0.1:${apiPort}` },
      '/auth': { target: `http://127.0.0.1:${apiPort}` },
      '/fake-github': { target: `http://127.0.0.1:${apiPort}` },
    },
  },
});
