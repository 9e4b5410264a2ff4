import { fileURLToPath } from 'node:url';
import { defineConfig, type Plugin } from 'vite';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';

const apiPort = Number(process.env.PORT ?? 5480);

/**
 * The renderer's Canvas module imports all of three.js to fill its element catalogue; it gets the
 * views' own few classes instead (src/scene/three-catalogue.ts), so the build can leave out the rest.
 */
function threeCatalogue(): Plugin {
  const catalogue = fileURLToPath(new URL('./src/scene/three-catalogue.ts', import.meta.url));
  return {
    name: 'parlour-three-catalogue',
    enforce: 'pre',
    resolveId(source, importer) {
      if (source === 'three' && importer && /@react-three[\\/]fiber[\\/]dist[\\/]react-three-fiber\.esm\.js$/.test(importer))
        return catalogue;
      return null;
    },
  };
}

export default defineConfig({
  plugins: [threeCatalogue(), react(), tailwindcss()],
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
