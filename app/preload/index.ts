/**
 * Preload of the sandboxed renderer (built as CommonJS to out/preload/index.cjs). Exposes the
 * narrow HostApi bridge as `window.hingelineHost` and nothing else.
 */
import { contextBridge, ipcRenderer } from 'electron';
import { createBridge } from './bridge.ts';

contextBridge.exposeInMainWorld('hingelineHost', createBridge(ipcRenderer));
