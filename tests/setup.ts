// Property tests run with one fixed seed so that CI is repeatable; set
// IONHEAT_FC_SEED to explore other inputs locally (and add any failure found
// as a named case).
import fc from 'fast-check';

const seed = process.env.IONHEAT_FC_SEED === undefined ? 20261201 : Number(process.env.IONHEAT_FC_SEED);
fc.configureGlobal({ seed });
