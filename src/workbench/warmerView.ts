/**
 * The Warmer panel: `latentWarmer` for a supercooled hydrate melt, shown as
 * `ionheat warmer` says it, with its course as a chart.
 *
 * @module
 */
import type { Dataset } from '../data/dataset.js';
import { latentWarmer, type WarmerFill } from '../warmer/latentWarmer.js';
import { warmerCourseSvg } from '../render/warmerCourse.js';
import { estimateQuantity, panelView, plainQuantity, type PanelView } from './view.js';

const MELTS = { congruent: 'congruently', 'semi-congruent': 'semi-congruently', incongruent: 'incongruently' } as const;

/** The Warmer panel's view of a fill. */
export function warmerView(fill: WarmerFill, dataset: Dataset): PanelView {
  const w = latentWarmer(fill, {}, dataset);
  const f = w.fill;
  const view = panelView(`Warmer: ${f.massG} g ${f.formula}${f.extraWaterG > 0 ? ` + ${f.extraWaterG} g extra water` : ''}, supercooled at ${f.startC} °C${f.containerJPerK > 0 ? `, container ${f.containerJPerK} J/K` : ''}`);
  view.cautions.push(...w.cautions);
  view.lines.push(`Melts ${MELTS[w.melt.melting]} at ${w.melt.meltingPoint.value} °C, latent heat ${w.melt.latentHeat.value} J/g.`);
  view.quantities.push(estimateQuantity('Plateau', w.plateau, 'plateau', '°C', { strong: true }));
  view.quantities.push(estimateQuantity('Crystallised at once (fraction of the hydrate)', w.crystallisedAtPlateau, 'crystallisedAtPlateau', ''));
  view.quantities.push(estimateQuantity('Heat released', w.heatReleased, 'heatReleased', 'kJ'));
  view.quantities.push(estimateQuantity('Heat per gram of fill', w.heatPerGram, 'heatPerGram', 'J/g'));
  view.quantities.push(estimateQuantity('Plateau duration', w.plateauDuration, 'plateauDuration', 's', { words: 'until all crystallised or 1 K below the plateau' }));
  if (w.rechargeTemperature) view.quantities.push(estimateQuantity('Recharge above', w.rechargeTemperature, 'rechargeTemperature', '°C'));
  else view.lines.push('Recharge: not reachable by heating in water (see notes).');
  view.quantities.push(plainQuantity('Liquidus of this fill', w.liquidusC, 'liquidusC', 2, '°C'));
  view.quantities.push(plainQuantity('Above 44 °C for about', w.secondsAboveBurnThreshold / 60, 'secondsAboveBurnThreshold/60', 0, 'min'));
  view.charts.push({ title: 'Temperature against time after triggering', svg: warmerCourseSvg(w) });
  view.notes.push(...w.notes);
  return view;
}
