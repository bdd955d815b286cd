// Entry of the sandboxed reduction processor. A worker thread does not inherit the TypeScript loader of
// its parent when the parent was not started with `--import tsx` (test runners, bundlers), so it
// registers one itself before loading the processor.
import { register } from 'tsx/esm/api';

register();
const processor = await import('./reduction-processor.ts');

export default processor.default;
