// Stands in for zod's JSON Schema reader (zod/v4/classic/from-json-schema.js) in the app's bundle
// (metro.config.js): the app builds its schemas in shared/schemas and never reads one from JSON Schema.
export function fromJSONSchema(): never {
  throw new Error("z.fromJSONSchema is not in Keyoff's app bundle (metro.config.js)");
}
