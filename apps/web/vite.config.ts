// Vite build and dev server of the Hexloom web app: /api proxied to the server, vendor chunks split.
import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';

export default defineConfig({
  plugins: [react()],
  server: {
    port: 5173,
    // The API refuses writes from another origin; the dev server forwards them as the API's own origin.
    proxy: { '/api': { target: 'http://localhost:3000', changeOrigin: false, headers: { origin: 'http://localhost:3000' } } },
  },
  preview: { port: 4173 },
  build: {
    outDir: 'dist',
    emptyOutDir: true,
    rolldownOptions: {
      output: {
        // @blueprintjs/icons is left out on purpose: its icon paths are lazy chunks.
        codeSplitting: {
          groups: [
            { name: 'vendor-react', test: /node_modules[\\/](react|react-dom|scheduler|react-router|react-router-dom)[\\/]/ },
            { name: 'vendor-blueprint', test: /node_modules[\\/]@blueprintjs[\\/](core|table|colors)[\\/]/ },
            { name: 'vendor-tanstack', test: /node_modules[\\/]@tanstack[\\/]/ },
            { name: 'vendor-d3', test: /node_modules[\\/](d3|d3-[a-z-]+|internmap|delaunator|robust-predicates)[\\/]/ },
          ],
        },
      },
    },
  },
});
