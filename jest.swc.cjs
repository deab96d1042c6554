// One SWC transform for every ESM workspace's Jest: TypeScript, legacy decorators with metadata.
module.exports = {
  jsc: {
    parser: { syntax: 'typescript', decorators: true, tsx: false },
    transform: { legacyDecorator: true, decoratorMetadata: true, useDefineForClassFields: false },
    target: 'es2022',
    keepClassNames: true,
  },
  module: { type: 'es6' },
  sourceMaps: 'inline',
};
