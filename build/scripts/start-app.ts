/**
 * `npm start` (through build/scripts/start.mjs): build, then run the desktop app with the demo
 * project, or, when the Electron runtime is missing (it is downloaded lazily and cannot be on an
 * offline machine), say so once and serve the same interface in the browser on 127.0.0.1.
 *
 * Options: `--web` serves the browser build even when Electron is available; `--no-build`
 * (or HINGELINE_SKIP_BUILD=1) reuses existing builds; `--verbose` (or HINGELINE_VERBOSE=1) shows the
 * bundlers' own reports, which are hidden otherwise. HINGELINE_PORT picks the port (default: free).
 */
import { spawn, spawnSync } from 'node:child_process';
import { existsSync, readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { dirname, join, relative } from 'node:path';
import { fileURLToPath } from 'node:url';
import { portFromEnvironment, startWebServer } from './web-server.ts';

export const PROJECT_ROOT = fileURLToPath(new URL('../..', import.meta.url));

export type RuntimeCheck = { readonly available: true; readonly binary: string } | { readonly available: false; readonly reason: string };

export interface RuntimeProbe {
  readonly root: string;
  readonly env: Readonly<Record<string, string | undefined>>;
  readonly platform: NodeJS.Platform;
  readonly exists: (path: string) => boolean;
  readonly readText: (path: string) => string | null;
  /** Folder of the installed `electron` package, or null when it is not installed. */
  readonly electronPackageFolder: string | null;
}

/**
 * Whether Electron can be started, decided from files only — never by requiring `electron`,
 * which would try to download the runtime and hang or fail offline.
 */
export function checkElectronRuntime(probe: RuntimeProbe): RuntimeCheck {
  const folder = probe.electronPackageFolder;
  if (folder === null) return { available: false, reason: 'the electron package is not installed (run npm install)' };
  const shown = (path: string): string => relative(probe.root, path) || path;
  const pathFile = join(folder, 'path.txt');
  const executable = probe.readText(pathFile)?.trim() ?? '';
  const override = probe.env.ELECTRON_OVERRIDE_DIST_PATH;
  let binary: string;
  if (override) {
    binary = join(override, executable || 'electron');
  } else if (executable === '') {
    return {
      available: false,
      reason: `${shown(pathFile)} is missing: the Electron binary was never downloaded and cannot be downloaded on this machine`,
    };
  } else {
    binary = join(folder, 'dist', executable);
  }
  if (!probe.exists(binary)) return { available: false, reason: `the Electron binary ${shown(binary)} is missing` };
  if (probe.platform === 'linux' && !probe.env.DISPLAY && !probe.env.WAYLAND_DISPLAY) {
    return { available: false, reason: 'there is no graphical display (DISPLAY and WAYLAND_DISPLAY are unset)' };
  }
  return { available: true, binary };
}

function packageFolder(name: string): string | null {
  try {
    return dirname(createRequire(import.meta.url).resolve(`${name}/package.json`));
  } catch {
    return null;
  }
}

function probeThisMachine(): RuntimeProbe {
  return {
    root: PROJECT_ROOT,
    env: process.env,
    platform: process.platform,
    exists: existsSync,
    readText: (path) => {
      try {
        return readFileSync(path, 'utf8');
      } catch {
        return null;
      }
    },
    electronPackageFolder: packageFolder('electron'),
  };
}

export interface StartOutput {
  log(message: string): void;
  error(message: string): void;
}

/**
 * The bundlers' own reports (plugin timing tables, chunk-size advice) are for whoever works on the
 * build: shown with `--verbose` or HINGELINE_VERBOSE=1, otherwise only errors are printed.
 */
export function buildVerbose(args: readonly string[], env: Readonly<Record<string, string | undefined>>): boolean {
  return args.includes('--verbose') || env.HINGELINE_VERBOSE === '1';
}

/** Inline options for Vite's build of the web UI: quiet (errors only, no timing tables) unless verbose. */
export function webBuildOptions(verbose: boolean) {
  return {
    configFile: join(PROJECT_ROOT, 'vite.web.config.ts'),
    logLevel: verbose ? ('info' as const) : ('error' as const),
    ...(verbose ? {} : { build: { chunkSizeWarningLimit: 100_000, rolldownOptions: { checks: { pluginTimings: false } } } }),
  };
}

async function buildWeb(verbose: boolean): Promise<void> {
  const { build } = await import('vite');
  await build(webBuildOptions(verbose));
}

function buildElectron(verbose: boolean, output: StartOutput): boolean {
  const electronVite = packageFolder('electron-vite');
  if (!electronVite) return false;
  const result = spawnSync(process.execPath, [join(electronVite, 'bin/electron-vite.js'), 'build', '--config', 'electron.config.ts', ...(verbose ? [] : ['--logLevel', 'error'])], {
    cwd: PROJECT_ROOT,
    stdio: verbose ? 'inherit' : ['ignore', 'pipe', 'pipe'],
    encoding: 'utf8',
  });
  // Quiet unless it failed: then everything it said is needed.
  if (!verbose && result.status !== 0) output.error(`${result.stdout ?? ''}${result.stderr ?? ''}`.trim());
  return result.status === 0;
}

function runElectron(binary: string): Promise<number> {
  return new Promise((resolvePromise) => {
    const child = spawn(binary, ['.', '--demo'], { cwd: PROJECT_ROOT, stdio: 'inherit' });
    const forward = (signal: NodeJS.Signals): void => void child.kill(signal);
    process.on('SIGINT', forward);
    process.on('SIGTERM', forward);
    child.on('error', () => resolvePromise(1));
    child.on('exit', (code, signal) => resolvePromise(code ?? (signal ? 1 : 0)));
  });
}

async function serveWeb(output: StartOutput, skipBuild: boolean, verbose: boolean): Promise<number> {
  let port: number;
  try {
    port = portFromEnvironment(process.env);
  } catch (error) {
    output.error(`Hingeline: ${(error as Error).message}`);
    return 2;
  }
  const webRoot = join(PROJECT_ROOT, 'out/web');
  if (!skipBuild || !existsSync(join(webRoot, 'index.html'))) await buildWeb(verbose);
  let server;
  try {
    server = await startWebServer(webRoot, port);
  } catch (error) {
    const code = (error as NodeJS.ErrnoException).code;
    output.error(code === 'EADDRINUSE' ? `Hingeline: port ${port} on 127.0.0.1 is already in use; set HINGELINE_PORT to another port.` : `Hingeline: the web server could not start: ${String(error)}`);
    return 1;
  }
  output.log(`Hingeline is running at ${server.url}?demo  (press Ctrl+C to stop)`);
  return new Promise((resolvePromise) => {
    const stop = (): void => void server.close().then(() => resolvePromise(0));
    process.once('SIGINT', stop);
    process.once('SIGTERM', stop);
  });
}

/** Runs `npm start`; resolves to the exit code. */
export async function main(args: readonly string[], output: StartOutput = { log: console.log, error: console.error }): Promise<number> {
  const skipBuild = args.includes('--no-build') || process.env.HINGELINE_SKIP_BUILD === '1';
  const verbose = buildVerbose(args, process.env);
  if (args.includes('--web')) {
    output.log('Hingeline: serving the browser build (--web).');
    return serveWeb(output, skipBuild, verbose);
  }
  const runtime = checkElectronRuntime(probeThisMachine());
  if (!runtime.available) {
    output.log(`Hingeline: the Electron runtime is not available (${runtime.reason}), so the same interface is served in your browser instead.`);
    return serveWeb(output, skipBuild, verbose);
  }
  if (!skipBuild && !buildElectron(verbose, output)) {
    output.error('Hingeline: the desktop build failed (see the messages above).');
    return 1;
  }
  return runElectron(runtime.binary);
}
