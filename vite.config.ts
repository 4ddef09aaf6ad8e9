// The web companion: React + Tailwind, built to dist/web; /api goes to the team server in dev and preview.
import { defineConfig, type ProxyOptions } from 'vite';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';
import { fileURLToPath } from 'node:url';

const here = (p: string) => fileURLToPath(new URL(p, import.meta.url));

/** The Express server another process runs; override with PANELPOINT_API. */
const api: Record<string, ProxyOptions> = {
  '/api': { target: process.env.PANELPOINT_API ?? 'http://127.0.0.1:8080', changeOrigin: false },
};

export default defineConfig({
  plugins: [react(), tailwindcss()],
  resolve: {
    alias: [
      { find: /^@\//, replacement: `${here('./src')}/` },
      { find: /^@shared\//, replacement: `${here('./shared')}/` },
    ],
  },
  server: { host: '127.0.0.1', port: 5173, strictPort: false, proxy: api },
  preview: { host: '127.0.0.1', port: 4173, strictPort: false, proxy: api },
  build: {
    outDir: 'dist/web',
    emptyOutDir: true,
    sourcemap: true,
    // The engine (ajv, mathjs) is only loaded by the pages that draw or probe a truss.
    chunkSizeWarningLimit: 900,
  },
});
