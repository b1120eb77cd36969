import { defineConfig } from "vite";
import react from "@vitejs/plugin-react";
import tailwindcss from "@tailwindcss/vite";
import { fileURLToPath } from "node:url";

const apiPort = Number(process.env.PORT ?? 8080);

// The client lives in src/; `npm run dev` proxies /api to the Express server on PORT.
export default defineConfig({
  root: "src",
  publicDir: false,
  plugins: [react(), tailwindcss()],
  resolve: {
    alias: {
      "@shared": fileURLToPath(new URL("./shared", import.meta.url)),
      "@": fileURLToPath(new URL("./src", import.meta.url)),
    },
  },
  server: {
    port: 5173,
    proxy: { "/api": { target: `http://127.0.0.1:${apiPort}`, changeOrigin: false } },
  },
  build: { outDir: "../dist/client", emptyOutDir: true, sourcemap: true, chunkSizeWarningLimit: 1500 },
});
