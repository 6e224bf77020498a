// ESLint: the recommended rule sets of ESLint, typescript-eslint and React's hooks rules. One
// option is set: a key taken out of an object to drop it (`const { a, ...rest } = o`) is not an
// unused variable. `npm run lint` runs this with prettier --check and knip.
import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import reactHooks from 'eslint-plugin-react-hooks';
import globals from 'globals';

export default tseslint.config(
  { ignores: ['dist/', '.bench/', 'test/.tmp/'] },
  js.configs.recommended,
  tseslint.configs.recommended,
  reactHooks.configs['recommended-latest'],
  { languageOptions: { globals: { ...globals.node } } },
  {
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { ignoreRestSiblings: true }],
    },
  },
);
