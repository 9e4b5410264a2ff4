import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';

const apiPort = Number(process.env.PORT ?? 5480);

export default defineConfig({
  plugins: [react(), tailwindcss()],
  build: {
    outDir: 'dist',
    chunkSizeWarningLimit: 1200,
    // The manifest lets a test walk each entry's chunk graph; the client's page is an entry of
    // its own so it never downloads the designer's app.
    manifest: true,
    rollupOptions: {
      input: {
        app: 'index.html',
        clientPage: 'src/features/client-page/presentation.html',
      },
    },
  },
  server: {
    proxy: {
      '/api': `http://127.0.0.1:${apiPort}`,
    },
  },
});
