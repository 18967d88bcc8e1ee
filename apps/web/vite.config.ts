import { fileURLToPath } from 'node:url';
import react from '@vitejs/plugin-react';
import { defineConfig } from 'vite';

const fromHere = (relative: string): string => fileURLToPath(new URL(relative, import.meta.url));

// The API serves the built app itself; in development Vite forwards its routes to it.
const api = 'http://127.0.0.1:3000';

// Heavy libraries used by only some pages get chunks of their own, so the sign-in page's first
// load never carries them. Their dependencies (e.g. @mui/material parts) are left out of the group
// on purpose: pulled in, they would drag shared code into the heavy chunk and the heavy chunk into
// every page. Everything else is split automatically along the lazy routes. Groups without their
// dependencies can import each other in a circle, so `strictExecutionOrder` below keeps every
// module running in source order (about 5 % more bytes; without it the grid broke at load time).
const chunkGroups = [
  {
    name: 'data-grid',
    test: /node_modules[\\/]@mui[\\/]x-(data-grid|internals|virtualizer)[\\/]/,
    includeDependenciesRecursively: false,
  },
  {
    name: 'charts',
    test: /node_modules[\\/](recharts|victory-vendor|d3-[a-z-]+|internmap|decimal\.js-light)[\\/]/,
    includeDependenciesRecursively: false,
  },
  { name: 'react', test: /node_modules[\\/](react|react-dom|scheduler|react-router|react-router-dom|cookie)[\\/]/ },
  { name: 'zod', test: /node_modules[\\/]zod[\\/]/ },
  { name: 'contracts', test: /packages[\\/]contracts[\\/]src[\\/]/ },
  // Only the MUI core the entry needs at once (theme, styling engine); components ride with their pages.
  {
    name: 'mui-core',
    test: /node_modules[\\/](@mui[\\/](material|system|utils|styled-engine|private-theming)|@emotion[\\/][a-z-]+|stylis)[\\/]/,
    tags: ['$initial' as const],
    includeDependenciesRecursively: false,
  },
];

export default defineConfig({
  plugins: [react()],
  resolve: {
    alias: {
      '@evenset/contracts': fromHere('../../packages/contracts/src/index.ts'),
      '@evenset/metrology': fromHere('../../packages/metrology/src/index.ts'),
    },
  },
  server: {
    host: '127.0.0.1',
    port: 5173,
    strictPort: true,
    proxy: {
      '/api': { target: api, changeOrigin: false },
    },
  },
  preview: { host: '127.0.0.1', port: 4173 },
  build: {
    outDir: 'dist',
    emptyOutDir: true,
    sourcemap: true,
    // Lists each chunk's imports, so the bundle-size check can add up what a route loads first.
    manifest: true,
    rolldownOptions: {
      output: { codeSplitting: { groups: chunkGroups }, strictExecutionOrder: true },
    },
  },
});
