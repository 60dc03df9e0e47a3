/**
 * The two WebAssembly LP solvers, loaded once per thread. Both loaders are
 * asynchronous while their solve calls are synchronous, so loading them with a
 * top-level await lets every engine function stay synchronous (about 70 ms at
 * start-up on the 2-core machine, measured).
 */
import highsLoader from 'highs';
import GLPK from 'glpk.js/node';

export const highs = await highsLoader();
export const glpk = await GLPK();

export type HighsRuntime = typeof highs;
export type GlpkRuntime = typeof glpk;
