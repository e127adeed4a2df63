// Lint rules that keep each layer where it may run (see DEVELOPERS.md, "Layers").
import tseslint from 'typescript-eslint';
import pluginVue from 'eslint-plugin-vue';
import globals from 'globals';

/**
 * The layers inside core/, lowest first. A folder (or a file at core/'s root) may import only the
 * layers listed before it: the graph has no cycles (test/core/architecture.test.ts checks it) and
 * a change in one layer reaches only the layers above it. DEVELOPERS.md, "Layers inside core/".
 */
const CORE_LAYERS = ['errors.ts', 'numeric', 'units', 'diagnostics.ts', 'materials', 'section', 'member', 'continuous', 'retrofit', 'assessment', 'project', 'analysis.ts', 'charts', 'report'];

/** no-restricted-imports patterns that keep core/<layer> from importing the layers above it. */
function coreLayerRules() {
  return CORE_LAYERS.map((layer, index) => {
    const above = CORE_LAYERS.slice(index + 1);
    const files = layer.endsWith('.ts') ? [`core/${layer}`] : [`core/${layer}/**/*.ts`];
    const patterns = above.map((upper) => ({
      regex: upper.endsWith('.ts') ? `(^|/)${upper.replace('.', '\\.')}$` : `(^|/)${upper}/`,
      message: `core/${layer} sits below core/${upper} and must not import it (DEVELOPERS.md, "Layers inside core/").`,
    }));
    return { files, rules: { 'no-restricted-imports': ['error', { patterns: [...CORE_OUTSIDE_PATTERNS, ...patterns] }] } };
  });
}

const nodeBuiltins = [
  'node:*', 'fs', 'fs/promises', 'path', 'os', 'child_process', 'worker_threads', 'url', 'crypto', 'stream', 'http', 'net', 'util',
];

/** What core/ may never import, whatever its layer. */
const CORE_OUTSIDE_PATTERNS = [
  { group: ['**/app/**', '**/renderer/**'], message: 'core/ must not import from app/ or renderer/.' },
  { group: ['electron', 'electron/*'], message: 'core/ must not use Electron.' },
  { group: nodeBuiltins, message: 'core/ must not use Node APIs.' },
  { group: ['vue', 'pinia', 'chart.js', 'chart.js/*', 'pdfmake', 'pdfmake/*', '@napi-rs/*'], message: 'core/ stays free of UI, PDF and canvas libraries; inject them.' },
];

export default tseslint.config(
  { ignores: ['node_modules/**', 'out/**', 'dist/**', 'coverage/**', 'test-artifacts/**', 'build/sample/**'] },
  ...tseslint.configs.recommended,
  ...pluginVue.configs['flat/recommended'],
  {
    files: ['**/*.vue'],
    languageOptions: { parserOptions: { parser: tseslint.parser, extraFileExtensions: ['.vue'] } },
  },
  {
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
      '@typescript-eslint/consistent-type-imports': 'error',
      'no-var': 'error',
      'prefer-const': 'error',
      eqeqeq: ['error', 'always'],
      'vue/multi-word-component-names': 'off',
      'vue/max-attributes-per-line': 'off',
      'vue/singleline-html-element-content-newline': 'off',
      'vue/html-self-closing': 'off',
      'vue/html-indent': 'off',
      'vue/html-closing-bracket-newline': 'off',
      'vue/multiline-html-element-content-newline': 'off',
    },
  },
  // core/: pure engineering code. No DOM, no Node, no Electron, nothing from app/ or renderer/.
  {
    files: ['core/**/*.ts'],
    languageOptions: { globals: { ...globals.es2022 } },
    rules: {
      'no-restricted-imports': ['error', { patterns: CORE_OUTSIDE_PATTERNS }],
      'no-restricted-globals': ['error',
        { name: 'window', message: 'core/ runs outside the browser.' },
        { name: 'document', message: 'core/ runs outside the browser.' },
        { name: 'navigator', message: 'core/ runs outside the browser.' },
        { name: 'localStorage', message: 'core/ runs outside the browser.' },
        { name: 'process', message: 'core/ runs outside Node.' },
        { name: 'Buffer', message: 'core/ runs outside Node.' },
        { name: 'require', message: 'core/ is ES modules only.' },
        { name: '__dirname', message: 'core/ runs outside Node.' },
        { name: 'setTimeout', message: 'core/ is synchronous and deterministic.' },
        { name: 'setInterval', message: 'core/ is synchronous and deterministic.' },
        { name: 'Date', message: 'core/ is deterministic: pass dates in.' },
      ],
      'no-restricted-properties': ['error', { object: 'Math', property: 'random', message: 'core/ is deterministic.' }],
    },
  },
  // core/ layers: each imports only the layers below it (later entries override the rule above).
  ...coreLayerRules(),
  // renderer/: browser only; never app/.
  {
    files: ['renderer/**/*.{ts,vue}'],
    languageOptions: { globals: { ...globals.browser } },
    rules: {
      'no-restricted-imports': ['error', {
        patterns: [
          { group: ['**/app/**'], message: 'renderer/ talks to its host through HostApi, never app/.' },
          { group: ['electron', 'electron/*'], message: 'renderer/ is sandboxed: use HostApi.' },
          { group: nodeBuiltins, message: 'renderer/ runs in the browser.' },
        ],
      }],
    },
  },
  // app/preload: the bridge; only electron's renderer-side modules.
  {
    files: ['app/preload/**/*.ts'],
    rules: {
      'no-restricted-imports': ['error', {
        patterns: [
          { group: ['**/renderer/**', '**/main/**'], message: 'preload exposes HostApi calls only.' },
          { group: nodeBuiltins, message: 'the sandboxed preload has no Node modules.' },
        ],
      }],
    },
  },
  {
    files: ['app/**/*.ts', 'build/**/*.{ts,mjs,js}', 'test/**/*.ts', '*.config.{ts,js}', 'eslint.config.js'],
    languageOptions: { globals: { ...globals.node } },
  },
  {
    files: ['app/main/**/*.ts', 'app/cli/**/*.ts'],
    rules: {
      'no-restricted-imports': ['error', {
        patterns: [{ group: ['**/renderer/**'], message: 'app/ must not import the renderer.' }],
      }],
    },
  },
);
