/**
 * Where the command's own modules are: beside each other in the built bundle (out/cli/<build>/, see
 * build/scripts/cli-bundle.mjs, which defines `__HINGELINE_BUNDLE__`), or as TypeScript sources.
 */
declare const __HINGELINE_BUNDLE__: boolean | undefined;

/** True in the built bundle, false when the TypeScript sources run through a loader. */
export const BUNDLED: boolean = typeof __HINGELINE_BUNDLE__ !== 'undefined' && __HINGELINE_BUNDLE__;

/**
 * URL of one of the command's modules: `bundled` (a file name in the bundle's folder) or `source`
 * (relative to `base`, the caller's `import.meta.url`). In the bundle every module and chunk sits in
 * one folder, so `base` is that folder too.
 */
export function ownModule(base: string, bundled: string, source: string): URL {
  return new URL(BUNDLED ? `./${bundled}` : source, base);
}
