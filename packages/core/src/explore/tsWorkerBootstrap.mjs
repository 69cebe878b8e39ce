// Worker entry used only when running from TypeScript source (tsx, vitest): Node 20 does not
// apply `--import` loaders to worker threads, so this plain-JS module registers tsx's loader
// inside the worker, then imports the TypeScript worker module named by each task and calls its
// default export. Built code (dist/) runs its .js worker directly and never loads this file.
let registered = false;
const modules = new Map();

async function load(file) {
  let mod = modules.get(file);
  if (mod === undefined) {
    if (!registered) {
      const { register } = await import('tsx/esm/api');
      register();
      registered = true;
    }
    mod = await import(new URL(`file://${file}`).href);
    modules.set(file, mod);
  }
  return mod;
}

export default async function tsWorkerBootstrap(message) {
  const mod = await load(message.module);
  return mod.default(message.task);
}
