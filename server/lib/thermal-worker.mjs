// The thermal pool's worker entry: registers tsx in this thread (the server runs TypeScript through
// `node --import tsx`; a worker thread started from a plain .mjs file needs the loader too, also
// under vitest), then hands piscina the TypeScript task function.
import { register } from 'tsx/esm/api';

register();
const { default: run } = await import('./thermal-worker.ts');
export default run;
