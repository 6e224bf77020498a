// ESLint: the recommended rule sets of ESLint, typescript-eslint and React's hooks rules, nothing
// added. `npm run lint` runs it with prettier --check and knip (unused files, exports, packages).
import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import reactHooks from 'eslint-plugin-react-hooks';
import globals from 'globals';

export default tseslint.config(
  { ignores: ['dist/', '.bench/', 'node_modules/'] },
  js.configs.recommended,
  tseslint.configs.recommended,
  reactHooks.configs['recommended-latest'],
  { languageOptions: { globals: { ...globals.node } } },
);
