import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';

export default defineConfig({
  plugins: [react()],
  worker: { format: 'es' },
  build: {
    chunkSizeWarningLimit: 1500,
    rolldownOptions: {
      onwarn(warning, handler) {
        // logic-solver ships an asm.js MiniSat that uses direct eval; it is expected.
        if (warning.code === 'EVAL' && warning.id?.includes('logic-solver')) return;
        handler(warning);
      },
    },
  },
  preview: { port: 4173, strictPort: true, host: '127.0.0.1' },
  server: { port: 5173, strictPort: true, host: '127.0.0.1' },
});
