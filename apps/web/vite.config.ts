import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';

/** The API the dev and preview servers forward `/api` to (the API's default port unless PL_API_PORT says otherwise). */
const apiTarget = `http://127.0.0.1:${process.env.PL_API_PORT ?? 8787}`;
const proxy = { '/api': { target: apiTarget } };

export default defineConfig({
  plugins: [react(), tailwindcss()],
  server: { proxy },
  preview: { proxy },
  build: { outDir: 'dist', emptyOutDir: true },
});
