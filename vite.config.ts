import { fileURLToPath } from 'node:url';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';
import { defineConfig } from 'vite';

const root = (p: string) => fileURLToPath(new URL(p, import.meta.url));
const apiTarget = `http://127.0.0.1:${process.env.PORT ?? '3000'}`;

export const aliases = {
  '@shared': root('./shared'),
  '@client': root('./client'),
  '@server': root('./server'),
  '@tests': root('./tests'),
};

export default defineConfig({
  plugins: [react(), tailwindcss()],
  resolve: { alias: aliases },
  build: { outDir: 'dist/client', emptyOutDir: true, sourcemap: false },
  server: {
    host: '127.0.0.1',
    port: Number(process.env.VITE_PORT ?? 5173),
    proxy: {
      '/api': { target: apiTarget, changeOrigin: false },
      '/dev': { target: apiTarget, changeOrigin: false },
      '/socket.io': { target: apiTarget, changeOrigin: false, ws: true },
    },
  },
});
