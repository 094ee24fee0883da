import { fileURLToPath } from 'node:url';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';
import { defineConfig } from 'vite';

const fromRoot = (path: string) => fileURLToPath(new URL(path, import.meta.url));

export const aliases = {
  '@': fromRoot('./src'),
  '@server': fromRoot('./server'),
  '@shared': fromRoot('./shared'),
};

export default defineConfig({
  plugins: [react(), tailwindcss()],
  resolve: { alias: aliases },
  build: { outDir: 'dist/client', emptyOutDir: true },
});
