import { mkdtempSync, statSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { describe, expect, it } from 'vitest';
import { bundledWorker } from './bundleWorker.js';

describe('bundledWorker(tsFile)', () => {
  it('bundles a TypeScript worker and its imports into one ES module, reuses it, and rebuilds when an input changes', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'fk-bundle-'));
    const kernel = join(dir, 'kernel.ts');
    const worker = join(dir, 'worker.ts');
    writeFileSync(kernel, 'export const scale: number = 2;\n');
    writeFileSync(worker, "import { scale } from './kernel.js';\nexport default (x: number): number => x * scale;\n");
    const first = await bundledWorker(worker);
    expect(first).toBeDefined();
    const mod = (await import(`${pathToFileURL(first!).href}?v=1`)) as { default: (x: number) => number };
    expect(mod.default(21)).toBe(42);
    const built = statSync(first!).mtimeMs;
    expect(await bundledWorker(worker)).toBe(first); // cached
    expect(statSync(first!).mtimeMs).toBe(built);
    await new Promise((r) => setTimeout(r, 20));
    writeFileSync(kernel, 'export const scale: number = 3;\n');
    const second = await bundledWorker(worker);
    const again = (await import(`${pathToFileURL(second!).href}?v=2`)) as { default: (x: number) => number };
    expect(again.default(21)).toBe(63);
  });
});
