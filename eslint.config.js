import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import reactHooks from 'eslint-plugin-react-hooks';

// The engine (model, catalogue, solver) runs under plain Node and in the browser alike:
// it must never reach for the UI, the store or a PDF library, not even for a type.
const engineBans = {
  patterns: [
    { group: ['react', 'react-dom', 'react/*', 'react-dom/*'], message: 'The engine never imports React.' },
    { group: ['@xyflow/*', 'reactflow'], message: 'The engine never imports React Flow.' },
    { group: ['zustand', 'zustand/*', 'zundo'], message: 'The engine never imports the store library.' },
    {
      group: ['jspdf', 'jspdf-*', 'svg2pdf.js', 'svg2pdf.js/*'],
      message: 'The engine never imports PDF code.',
    },
    {
      group: ['**/store/**', '**/ui/**', '**/export/**', '**/cli/**'],
      message: 'Engine code depends on nothing above it.',
    },
  ],
};

// Exports sit above the engine and below the editor and the CLI, which both use them.
const exportBans = {
  patterns: [
    ...engineBans.patterns
      .slice(0, 3)
      .map((p) => ({ ...p, message: p.message.replace('The engine', 'Export code') })),
    { group: ['**/store/**', '**/ui/**', '**/cli/**'], message: 'Export code depends on nothing above it.' },
  ],
};

export default tseslint.config(
  { ignores: ['dist', 'node_modules', 'coverage', 'test-artifacts', 'bench-results'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    files: ['**/*.{ts,tsx}'],
    plugins: { 'react-hooks': reactHooks },
    rules: {
      'react-hooks/rules-of-hooks': 'error',
      'react-hooks/exhaustive-deps': 'warn',
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
      '@typescript-eslint/consistent-type-imports': 'error',
    },
  },
  {
    files: ['src/model/**', 'src/catalogue/**', 'src/solver/**'],
    rules: {
      'no-restricted-imports': ['error', engineBans],
      '@typescript-eslint/no-restricted-imports': [
        'error',
        { ...engineBans, patterns: engineBans.patterns.map((p) => ({ ...p, allowTypeImports: false })) },
      ],
    },
  },
  {
    // Exports (schedules, CSV) serve the editor and the CLI alike: no UI, store or CLI code.
    files: ['src/export/**'],
    rules: {
      'no-restricted-imports': ['error', exportBans],
      '@typescript-eslint/no-restricted-imports': [
        'error',
        { ...exportBans, patterns: exportBans.patterns.map((p) => ({ ...p, allowTypeImports: false })) },
      ],
    },
  },
  {
    files: ['**/*.{js,mjs}'],
    languageOptions: {
      globals: {
        process: 'readonly',
        console: 'readonly',
        URL: 'readonly',
        setTimeout: 'readonly',
        clearTimeout: 'readonly',
      },
    },
  },
);
