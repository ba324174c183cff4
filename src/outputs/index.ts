/** The outputs layer's public API: the JSON Schemas of the commands' JSON documents. */
export { OUTPUT_SCHEMA_NAMES, outputJsonSchema, type OutputSchemaName } from './output-schemas.js';
