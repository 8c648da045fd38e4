/**
 * The one way units are written for people: the SI symbol after a space
 * (`34.9 kJ/mol`, `22 °C`, `95 %`), kelvin for temperature differences and
 * degrees Celsius for temperatures.
 *
 * @module
 */

/** The unit symbols used in text and charts. */
export const UNIT = {
  enthalpy: 'kJ/mol',
  heatPerGram: 'J/g',
  heat: 'kJ',
  temperature: '°C',
  temperatureChange: 'K',
  mass: 'g',
  ratio: 'g/g',
  time: 's',
  minutes: 'min',
  conductance: 'W/K',
  heatCapacity: 'J/K',
  molarMass: 'g/mol',
  percent: '%',
} as const;

/** A number's text and its unit, with the space SI writes between them (`22 °C`, `95 %`). */
export function withUnit(numberText: string, unit: string): string {
  return unit === '' ? numberText : `${numberText} ${unit}`;
}
