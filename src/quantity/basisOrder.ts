/** The bases of an estimate in order of trust: `measured`, `cycle`, `anchored`, `model` (see `basisSchema`). */
export const basisOrder = ['measured', 'cycle', 'anchored', 'model'] as const;
