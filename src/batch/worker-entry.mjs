// Entry of an interpretation worker thread: registers the TypeScript loader (the
// --import flag of a worker's execArgv does not reach its module loader on Node 20),
// then loads the worker itself.
import { register } from 'tsx/esm/api';

register();
await import('./worker.ts');
