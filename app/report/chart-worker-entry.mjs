// Worker-thread entry of app/report/chart-workers.ts: a worker starts without the parent's
// TypeScript loader, so it registers tsx for itself, then loads the TypeScript worker body.
import { register } from 'tsx/esm/api';

register();
await import('./chart-worker.ts');
