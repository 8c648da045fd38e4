// One set of charts drawn from varied inputs (hot and cold, bands near the thresholds, clamps, every cycle
// unknown, screens with outliers, a fill and a spec), shared by the layout checks and the PNG rendering.
import { bornHaberCycle, cycleDiagram, intervalChart, latentWarmer, packCurveSvg, packRatioCurve, packTimeCourse, screen, timeCourseSvg, warmerCourseSvg } from '../../src/index.js';
import { basisChart } from '../../src/render/basisChart.js';
import { dissolve } from '../../src/index.js';

export interface Chart {
  name: string;
  svg: string;
}

export function chartFixtures(): Chart[] {
  const charts: Chart[] = [];
  const add = (name: string, svg: string) => charts.push({ name, svg });
  // Every basis of one salt (the workbench's Salt panel): endothermic, exothermic, and a salt known by models only.
  add('bases-NH4NO3', basisChart(dissolve('NH4NO3')));
  add('bases-CaCl2', basisChart(dissolve('CaCl2')));
  add('bases-RbSCN', basisChart(dissolve('RbSCN')));
  add('cycle-NaCl-lattice', cycleDiagram(bornHaberCycle('NaCl')));
  add('cycle-CaCl2-lattice', cycleDiagram(bornHaberCycle('CaCl2')));
  add('cycle-MgO-electron-affinity', cycleDiagram(bornHaberCycle('MgO', { solve: 'electron-affinity', latticeEnthalpy: { value: 3792, u: 20 } })));
  add('cycle-KCl-formation', cycleDiagram(bornHaberCycle('KCl', { solve: 'formation', latticeEnthalpy: { value: 717, u: 3 } })));
  add('cycle-KNO3-lattice', cycleDiagram(bornHaberCycle('KNO3')));
  add('curve-NH4NO3-cold-target', packCurveSvg(packRatioCurve({ solids: [{ formula: 'NH4NO3', massG: 1 }], waterG: 100, startC: 22 }, { points: 40, targetC: 5 })));
  add('curve-CaCl2-hot-boiling', packCurveSvg(packRatioCurve({ solids: [{ formula: 'CaCl2', massG: 1 }], waterG: 100, startC: 20 }, { points: 40, targetC: 50 })));
  add('curve-KNO3-cold', packCurveSvg(packRatioCurve({ solids: [{ formula: 'KNO3', massG: 1 }], waterG: 100, startC: 20 }, { points: 40, targetC: 12 })));
  add('curve-mixed-hot-target-near-burn', packCurveSvg(packRatioCurve({ solids: [{ formula: 'CaCl2', massG: 3 }, { formula: 'MgSO4', massG: 1 }], waterG: 100, startC: 20 }, { points: 40, targetC: 45 })));
  add('course-CaCl2-hot-band', timeCourseSvg(packTimeCourse({ solids: [{ formula: 'CaCl2', massG: 40 }], waterG: 100 }, { band: { lowC: 40, highC: 50 }, samples: 80 }), { fillLabel: '40 g CaCl2 in 100 g water' }));
  add('course-CaCl2-band-at-burn', timeCourseSvg(packTimeCourse({ solids: [{ formula: 'CaCl2', massG: 25 }], waterG: 100 }, { band: { lowC: 42, highC: 46 }, samples: 80 })));
  add('course-NH4NO3-cold-band', timeCourseSvg(packTimeCourse({ solids: [{ formula: 'NH4NO3', massG: 60 }], waterG: 100 }, { band: { lowC: 5, highC: 12 }, samples: 80 })));
  add('course-KNO3-cold-air-equals-skin', timeCourseSvg(packTimeCourse({ solids: [{ formula: 'KNO3', massG: 20 }], waterG: 100 }, { ambientC: 30, skinC: 31, samples: 60 })));
  const spec = 'fill.finalTemperature.value < 12';
  const withSpec = screen(['KNO3', 'NH4Cl', 'NaCl', 'NH4NO3', 'CaCl2', 'KCl', 'CO(NH2)2', 'NaCH3COO·3H2O', 'Li2S', 'Na2Se'], { objective: 'fill-temperature', fill: '30:100@22', spec });
  // The spec's threshold and the fill's start come from the screen result itself, not from marks passed in.
  add('screen-fill-spec', intervalChart(withSpec));
  const hotSpec = screen(['CaCl2', 'MgSO4', 'LiCl', 'Na2CO3', 'MgCl2', 'CaCl2·6H2O', 'KNO3'], { direction: 'heat', fill: '30:100@20', spec: 'fill.finalTemperature.value > 40 and fill.finalTemperature.high < 60' });
  add('screen-hot-fill-spec-window', intervalChart(hotSpec));
  const outliers = screen(['KNO3', 'NH4Cl', 'NaCl', 'KCl', 'NH4NO3', 'Li2S', 'K2Se', 'Na2Se', { formula: 'LiF', measuredEnthalpy: 5, measuredUncertainty: 300 }], { objective: 'heat-per-gram' });
  add('screen-heat-per-gram-outliers', intervalChart(outliers));
  add('screen-hot-enthalpy', intervalChart(screen(['CaCl2', 'MgSO4', 'LiCl', 'Na2CO3', 'KNO3', 'NaOH', 'MgCl2', 'NaCH3COO'], { direction: 'heat' })));
  add('warmer-sodium-acetate', warmerCourseSvg(latentWarmer({ salt: 'NaCH3COO·3H2O', massG: 100 }, { samples: 60 })));
  return charts;
}
