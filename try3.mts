const lib = await import('./dist/index.js');
const ds = lib.builtinDataset();
let t = performance.now();
lib.screen(['KNO3', 'RbSCN', 'CsI', 'MgSO4·7H2O'], { fill: { saltMassG: 40, waterMassG: 80, startC: 22 } }, ds);
console.log('warm 4', Math.round(performance.now() - t));
t = performance.now();
lib.screen(lib.enumerate({}, ds), {}, ds);
console.log('screenAll', Math.round(performance.now() - t));
