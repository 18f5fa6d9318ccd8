import tseslint from 'typescript-eslint';

export default tseslint.config(
  { ignores: ['dist/**', 'dist-*/**', 'node_modules/**', 'test-results/**', 'tests/fixtures/**/*.py'] },
  ...tseslint.configs.recommended,
  {
    rules: {
      'no-eval': 'error',
      'no-implied-eval': 'error',
      'no-new-func': 'error',
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
      'no-restricted-syntax': [
        'error',
        { selector: "JSXAttribute[name.name='dangerouslySetInnerHTML']", message: 'Data is rendered as text only.' },
        { selector: "AssignmentExpression[left.property.name='innerHTML']", message: 'Data is rendered as text only.' },
      ],
    },
  },
  {
    files: ['src/physics/**/*.ts'],
    rules: {
      'no-restricted-globals': ['error', 'window', 'document', 'navigator', 'localStorage', 'indexedDB', 'fetch'],
    },
  },
);
