/*
 * mathjs for the backend's CommonJS build. mathjs publishes its types as an ES module only, which
 * a CommonJS file cannot `import`; its package answers `require` with its CommonJS build (exports
 * "require"), typed the same. tsc checks the type below; typescript-eslint cannot read a
 * resolution-mode type, hence the two rules switched off for these lines only.
 */
/* eslint-disable @typescript-eslint/no-require-imports, @typescript-eslint/no-unsafe-assignment */
const mathjs = require('mathjs') as typeof import('mathjs', {
  with: { 'resolution-mode': 'import' },
});
/* eslint-enable @typescript-eslint/no-require-imports, @typescript-eslint/no-unsafe-assignment */

export const { expm, matrix, create, randomDependencies } = mathjs;
