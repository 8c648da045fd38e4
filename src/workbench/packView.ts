/**
 * The Pack panel: the final temperature of a fill, what dissolves, the
 * ratio curve and time course, and a design for a target, with the cautions
 * first. The same library calls as `ionheat pack` (with its time course at
 * the assumed defaults).
 *
 * @module
 */
import type { Dataset } from '../data/dataset.js';
import { parseSalt } from '../chem/parseSalt.js';
import { formatSalt } from '../chem/formatSalt.js';
import { formulaText } from '../notation/formula.js';
import { packFinalTemperature } from '../pack/packFinalTemperature.js';
import type { PackFill } from '../pack/packInput.js';
import { packRatioCurve } from '../pack/packRatioCurve.js';
import { packTimeCourse } from '../pack/packTimeCourse.js';
import { packDesignMargin } from '../pack/designMargin.js';
import { packCurveSvg } from '../render/packCurve.js';
import { timeCourseSvg } from '../render/timeCourse.js';
import { warmerSalts } from '../warmer/warmerMelt.js';
import { estimateQuantity, panelView, plainQuantity, shown, type PanelView } from './view.js';

/** What the Pack panel asks. */
export interface PackRequest {
  fill: PackFill;
  /** A final temperature to design for, °C. */
  targetC?: number;
}

/** Points of the ratio curve drawn in the page (the command line's default without --curve is 40). */
export const PAGE_CURVE_POINTS = 60;

/** Everything the panel computes, by name: the paths of the numbers shown start with these names. */
export function packResults(request: PackRequest, dataset: Dataset) {
  const { fill, targetC } = request;
  const result = packFinalTemperature(fill, {}, dataset);
  const curve = packRatioCurve(fill, { ...(targetC !== undefined ? { targetC } : {}), points: PAGE_CURVE_POINTS, band: true }, {}, dataset);
  const course = packTimeCourse(fill, {}, {}, dataset);
  const margin = targetC !== undefined ? packDesignMargin(fill, targetC, {}, dataset) : undefined;
  return { result, curve, course, margin };
}

/** The Pack panel's view of a fill. */
export function packView(request: PackRequest, dataset: Dataset): PanelView {
  const { result, curve, course, margin } = packResults(request, dataset);
  const f = result.fill;
  const solids = f.solids.map((s) => `${s.massG} g ${formatSalt(parseSalt(s.formula, dataset), { style: 'unicode' })}`).join(' + ');
  const view = panelView(`Pack: ${solids} in ${f.waterG} g water, start ${f.startC} °C${f.containerJPerK > 0 ? `, container ${f.containerJPerK} J/K` : ''}`);
  if (margin?.caution) view.cautions.push(margin.caution);
  view.cautions.push(...course.cautions);
  const t = result.finalTemperature;
  view.quantities.push(estimateQuantity('Final temperature', t, 'result.finalTemperature', '°C', { strong: true, words: result.interval.method === 'bounds' ? '95 % interval by bounds' : `Monte Carlo, ${result.interval.samples} draws` }));
  view.quantities.push(plainQuantity('Change', result.temperatureChange, 'result.temperatureChange', 2, 'K', result.clamp ? `${result.clamp.kind} clamp` : undefined));
  view.quantities.push({ label: `Heat ${result.heat.direction === 'released' ? 'released' : 'absorbed'} by dissolution`, value: { ...shown(Math.abs(result.heat.absorbed), 'result.heat.absorbed', 3), magnitude: true }, unit: 'kJ' });
  view.quantities.push(plainQuantity('Heat capacity', result.heatCapacity.value, 'result.heatCapacity.value', 1, 'J/K', result.heatCapacity.basis === 'parts' ? 'from the parts' : 'your value'));
  view.quantities.push(plainQuantity('Liquid water at the end', result.liquidWater, 'result.liquidWater', 2, 'g'));
  view.quantities.push(plainQuantity('Ice at the end', result.iceMass, 'result.iceMass', 2, 'g'));
  view.tables.push({
    caption: 'What dissolves (g; ΔsolH(m) is the integral enthalpy of solution to the final molality, kJ/mol)',
    header: ['solid', 'loaded g', 'dissolved g', 'undissolved g', 'mol/kg', 'ΔsolH(m) kJ/mol', '±', 'heat kJ'],
    numeric: [1, 2, 3, 4, 5, 6, 7],
    rows: result.dissolved.map((d, k) => {
      const p = `result.dissolved.${k}`;
      const integral = estimateQuantity('', d.integralEnthalpy, `${p}.integralEnthalpy`, 'kJ/mol', { signed: true });
      return [
        formulaText(d.formula) + (d.undissolvedSolid && d.undissolvedSolid.formula !== d.formula && d.undissolvedMass > 0 ? ` (left as ${formulaText(d.undissolvedSolid.formula)})` : ''),
        shown(d.loadedMass, `${p}.loadedMass`, 2),
        shown(d.dissolvedMass, `${p}.dissolvedMass`, 2),
        shown(d.undissolvedMass, `${p}.undissolvedMass`, 2),
        shown(d.molality, `${p}.molality`, 2),
        integral.value,
        integral.u!,
        shown(d.heat, `${p}.heat`, 3),
      ];
    }),
  });
  const lc = curve.largestChange;
  const bp = curve.bestPerGram;
  view.tables.push({
    caption: 'Design for this water and start temperature (ratio = g solid per g water)',
    header: ['design', 'ratio g/g', 'solid g', 'final °C'],
    numeric: [1, 2, 3],
    rows: [
      [lc.temperature < f.startC ? 'coldest' : 'hottest', shown(lc.ratio, 'curve.largestChange.ratio', 4), shown(lc.saltMass, 'curve.largestChange.saltMass', 2), shown(lc.temperature, 'curve.largestChange.temperature', 2)],
      ['most change per gram of fill', shown(bp.ratio, 'curve.bestPerGram.ratio', 4), shown(bp.saltMass, 'curve.bestPerGram.saltMass', 2), shown(bp.temperature, 'curve.bestPerGram.temperature', 2)],
      ...(curve.target?.design ? [[`target ${curve.target.target} °C`, shown(curve.target.design.ratio, 'curve.target.design.ratio', 4), shown(curve.target.design.saltMass, 'curve.target.design.saltMass', 2), shown(curve.target.design.temperature, 'curve.target.design.temperature', 2)]] : []),
    ],
  });
  if (curve.target) view.lines.push(`Target ${curve.target.target} °C: ${curve.target.message}`);
  if (margin) view.lines.push(`Margin: ${margin.message}`);
  view.quantities.push(plainQuantity(`Time course: ${course.extreme.temperature < course.startC ? 'coldest' : 'hottest'}`, course.extreme.temperature, 'course.extreme.temperature', 1, '°C'));
  view.quantities.push(plainQuantity('reached after', course.extreme.timeS / 60, 'course.extreme.timeS/60', 1, 'min'));
  if (course.secondsAboveBurnThreshold > 0) view.quantities.push(plainQuantity('Time above 44 °C', course.secondsAboveBurnThreshold / 60, 'course.secondsAboveBurnThreshold/60', 1, 'min'));
  view.charts.push({ title: 'Final temperature against the ratio of solid to water', svg: packCurveSvg(curve) });
  const label = `${f.solids.map((s) => `${s.massG} g ${s.formula}`).join(' + ')} in ${f.waterG} g water`;
  view.charts.push({ title: 'Temperature against time (assumed surroundings)', svg: timeCourseSvg(course, { fillLabel: label }) });
  // A hydrate that also makes a latent-heat warmer: said as the command line says it.
  const warmerSalt = new Set(warmerSalts(dataset));
  for (const s of f.solids) {
    const formula = parseSalt(s.formula, dataset).formula;
    if (warmerSalt.has(formula)) view.notes.push(`${formula} can also serve as a supercooled melt that crystallises on demand (a latent-heat warmer); this pack only dissolves it in water. For a warmer, see the Warmer panel.`);
  }
  view.notes.push(...result.notes, ...course.notes.slice(0, 2));
  return view;
}
