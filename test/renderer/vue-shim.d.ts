/**
 * For `tsc -p tsconfig.test.json`, which does not read .vue files: single-file components imported
 * by the renderer tests are typed as plain components. (vue-tsc, the editor and Vitest read the
 * real components; an ambient wildcard only applies where a module cannot be resolved.)
 */
declare module '*.vue' {
  import type { DefineComponent } from 'vue';
  const component: DefineComponent<Record<string, unknown>, Record<string, unknown>, unknown>;
  export default component;
}
