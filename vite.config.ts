import { fileURLToPath, URL } from 'node:url';
import vue from '@vitejs/plugin-vue';
import { defineConfig, type Plugin } from 'vite';
import { compression, defineAlgorithm } from 'vite-plugin-compression2';
import { constants } from 'node:zlib';

/** Preloads the heading font (the brand and every heading), so it lands before the text is drawn. */
function preloadHeadingFont(): Plugin {
  return {
    name: 'shipkeeper:preload-heading-font',
    transformIndexHtml: {
      order: 'post',
      handler(_html, ctx) {
        const font = Object.keys(ctx.bundle ?? {}).find((name) => /\/merriweather-700-[\w-]+\.woff2$/.test(name));
        return font ? [{ tag: 'link', attrs: { rel: 'preload', href: `/${font}`, as: 'font', type: 'font/woff2', crossorigin: '' }, injectTo: 'head' }] : [];
      },
    },
  };
}

export default defineConfig({
  plugins: [
    vue(),
    preloadHeadingFont(),
    // Brotli and gzip beside each file at build, at their best levels (once, not per request); the
    // server picks one by Accept-Encoding. Files under 256 bytes gain too little to be worth a variant.
    compression({
      algorithms: [defineAlgorithm('brotliCompress', { params: { [constants.BROTLI_PARAM_QUALITY]: 11 } }), defineAlgorithm('gzip', { level: 9 })],
      threshold: 256,
      logLevel: 'silent',
    }),
  ],
  resolve: {
    alias: {
      '@': fileURLToPath(new URL('./src', import.meta.url)),
      '@shared': fileURLToPath(new URL('./shared', import.meta.url)),
      // One Leaflet: @vue-leaflet imports the ESM build (only when not told to use the global `L`, which
      // we always do), our code, markercluster and geoman the UMD build that sets `L`; both were shipped
      'leaflet/dist/leaflet-src.esm': 'leaflet/dist/leaflet-src.js',
    },
  },
  server: {
    port: 5173,
    proxy: { '/api': { target: `http://localhost:${process.env.PORT ?? 3000}`, changeOrigin: false } },
  },
  build: {
    outDir: 'dist',
    emptyOutDir: true,
    chunkSizeWarningLimit: 600,
  },
});
