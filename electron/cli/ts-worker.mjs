// Worker-thread entry for TypeScript modules run with tsx: workers do not inherit tsx's loader,
// so each registers it and then loads the module named in workerData.module.
import { register } from 'tsx/esm/api';
import { workerData } from 'node:worker_threads';

register();
await import(workerData.module);
