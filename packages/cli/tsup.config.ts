import { copyFileSync, mkdirSync } from 'node:fs';
import { defineConfig } from 'tsup';

// dist/bin.js keeps the `#!/usr/bin/env node` line of src/bin.ts. @fluxkick/core and commander
// stay external (dependencies). The demo station is copied beside dist/ so that the
// published package carries it (commands/demo.ts finds it by walking up from dist/).
export default defineConfig({
  entry: ['src/bin.ts'],
  format: ['esm'],
  target: 'node20',
  clean: true,
  async onSuccess() {
    mkdirSync('examples', { recursive: true });
    copyFileSync('../../examples/demo-station.yaml', 'examples/demo-station.yaml');
  },
});
