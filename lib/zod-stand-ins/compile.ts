// Stands in for zod's ahead-of-time compiler (zod/v4/core/compile.js, about 10 KB compressed) in the app's
// bundle (metro.config.js): the app parses with zod's runtime parser and never calls z.compile. Same
// names; calling one says why it is not there.
const absent = (name: string) => () => {
  throw new Error(`z.${name} is not in Keyoff's app bundle (metro.config.js); parse with the schema itself`);
};

export const INVALID = Symbol.for('zod.compile.invalid');
export class ZodCompileAsyncError extends Error {}
export class ZodCompileUnsupportedError extends Error {}
export const compile = absent('compile');
export const withParser = absent('withParser');
export const compileFn = absent('compile');
