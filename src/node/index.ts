/**
 * ionheat's Node-only entry: reading override tables from files, and the
 * command line as a function (for tools that embed it).
 *
 * @packageDocumentation
 */
export { loadDataset, applyOverrideDocument } from './loadDataset.js';
export { parseJsonStrict } from './strictJson.js';
export { runCli } from './cli/main.js';
export type { CliIO } from './cli/io.js';
