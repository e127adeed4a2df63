/** Entry of the Electron main process (built to out/main/index.js). */
import { startMainProcess } from './main-process.ts';

void startMainProcess()?.catch((error: unknown) => {
  console.error('[hingeline] the main process failed to start:', error);
  process.exit(1);
});
