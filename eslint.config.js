// Lints the TypeScript sources; pure modules (shared/, server/domain/) may import only zod, the pure
// calculation libraries suncalc, @neaps/tide-predictor and highs (a MILP solver in WebAssembly), and each other.
import tseslint from 'typescript-eslint';

const pureRule = {
  'no-restricted-imports': ['error', {
    patterns: [
      { regex: '^(?!zod$|suncalc$|@neaps/tide-predictor$|highs$|\\.{1,2}/|@shared/)', message: 'Pure modules import only zod and other pure modules.' },
      { regex: '^\\.\\./(routes|services|db|adapters|middleware|cli|errors|config|app)\\b|/server/(?!domain/)|/src/|/fakes/', message: 'Pure modules import only zod and other pure modules.' },
    ],
  }],
  'no-restricted-properties': ['error', { object: 'Date', property: 'now', message: 'Pass the time in.' }, { object: 'Math', property: 'random', message: 'Pass randomness in.' }],
  'no-restricted-globals': ['error', { name: 'process', message: 'Pure modules read no environment.' }, { name: 'fetch', message: 'Pure modules do no I/O.' }],
};

export default tseslint.config(
  { ignores: ['dist/**', 'node_modules/**', '.data/**', 'src/**/*.vue'] },
  ...tseslint.configs.recommended,
  {
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
    },
  },
  { files: ['shared/**/*.ts', 'server/domain/**/*.ts'], rules: pureRule },
  { files: ['tests/**/*.ts'], rules: { '@typescript-eslint/no-non-null-assertion': 'off' } },
);
