/** Writes docs/design-file.md from the design schema. Run: pnpm tsx packages/core/scripts/design-doc.ts */
import { writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { designFileMarkdown } from '../src/design/doc.js';

const target = fileURLToPath(new URL('../../../docs/design-file.md', import.meta.url));
writeFileSync(target, designFileMarkdown());
console.log(`wrote ${target}`);
