/**
 * The units a chart prints, with the conversions from what figures are stored in (cm, mW/cm²).
 * The reader's choice (useDisplayUnits()) has this shape, so a public page passes it straight in;
 * staff pages leave it out and keep the trade's units.
 */
export interface ChartUnits {
  length: string;
  irradiance: string;
  lengthValue: (cm: number) => number;
  irradianceValue: (mwCm2: number) => number;
}

export const TRADE_CHART_UNITS: ChartUnits = {
  length: 'cm',
  irradiance: 'mW/cm²',
  lengthValue: (cm) => cm,
  irradianceValue: (mwCm2) => mwCm2,
};
