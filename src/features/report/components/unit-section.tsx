import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { OBTAINED_LABELS } from '#shared/schemas/device-units.ts';
import { CATEGORY_LABELS, type ModelCategory } from '#shared/schemas/models.ts';
import type { PublicReport } from '#shared/schemas/reports.ts';
import { useDisplayUnits } from '#src/lib/display-units.tsx';
import { formatCount, formatDay, formatFigure, formatLength, formatMoney, formatTick } from '#src/lib/format.ts';
import { bandName } from '../utils/bands.ts';
import { ReportSection } from './report-section.tsx';
import { caption, td, th, thRow } from './table-styles.ts';
import { ScrollRegion } from './scroll-region.tsx';

type Instrument = PublicReport['instrument'];

function Facts({ label, items }: { label: string; items: { term: string; value: ReactNode }[] }) {
  return (
    <div className="space-y-2">
      <h3 className="text-lg font-semibold">{label}</h3>
      <dl className="grid grid-cols-[minmax(9rem,auto)_1fr] gap-x-4 gap-y-1.5 text-sm">
        {items.map((i) => (
          <div key={i.term} className="contents">
            <dt className="font-sans font-semibold text-ink-soft">{i.term}</dt>
            <dd>{i.value}</dd>
          </div>
        ))}
      </dl>
    </div>
  );
}

/** "Funded by 2 readers (€500.00)" or "Bought by the lab". */
export function fundingText(f: PublicReport['funding']): string {
  if (f.kind === 'lab') return 'Bought by the lab';
  const amounts = f.amounts.map((a) => formatMoney(a.amountMinor, a.currency)).join(' + ');
  return `Funded by ${formatCount(f.readers)} ${f.readers === 1 ? 'reader' : 'readers'}${amounts ? ` (${amounts})` : ''}`;
}

const obtainedLabel = (o: string) => OBTAINED_LABELS[o as keyof typeof OBTAINED_LABELS] ?? o;
const orDash = (v: string | number | null | undefined, unit = '') => (v === null || v === undefined ? '—' : `${v}${unit}`);

function instrumentFacts(i: Instrument): { term: string; value: ReactNode }[] {
  return [
    { term: 'Instrument', value: `${i.name} (${i.kind === 'spectroradiometer' ? 'spectroradiometer' : 'irradiance meter'}), serial ${i.serial}` },
    ...(i.wavelengthRangeNm ? [{ term: 'Wavelength range', value: `${formatLength(i.wavelengthRangeNm.from)}–${formatLength(i.wavelengthRangeNm.to)} nm` }] : []),
    ...(i.cosineCorrector ? [{ term: 'Cosine corrector', value: i.cosineCorrector }] : []),
    { term: 'Calibrated on', value: formatDay(i.calibratedOn) },
    { term: 'Calibration due', value: formatDay(i.calibrationDueOn) },
    { term: 'Calibration uncertainty', value: `± ${formatTick(i.calibrationUncertaintyPct)} %` },
  ];
}

/** The unit(s), the instrument, the grid, the bands and the conditions, then the method in brief. */
export function UnitSection({ report }: { report: PublicReport }) {
  const units = useDisplayUnits();
  const m = report.model;
  const lengths = (cms: readonly number[]) => `${cms.map((c) => formatLength(units.lengthValue(c))).join(', ')} ${units.length}`;
  const instruments = [...new Map([report.instrument, ...report.units.map((u) => u.instrument)].map((i) => [i.serial, i])).values()];
  const g = report.grid;
  const span = (v: readonly number[]) => (v.length ? `${units.formatLength(Math.min(...v))} to ${units.formatLength(Math.max(...v))}` : '—');
  const bands = Object.entries(report.bands).sort(([, a], [, b]) => a.loNm - b.loNm);
  const range = report.instrument.wavelengthRangeNm;
  const bandTop = bands.length ? Math.max(...bands.map(([, b]) => b.hiNm)) : null;
  const conditions = report.units[0]?.conditions;

  return (
    <ReportSection id="unit" title="The unit and how it was measured">
      <div className="grid gap-8 lg:grid-cols-2">
        <Facts
          label="The model"
          items={[
            { term: 'Maker', value: m.makerName },
            { term: 'Model', value: m.name },
            { term: 'Category', value: CATEGORY_LABELS[m.category as ModelCategory] ?? m.category },
            {
              term: 'Emitting area',
              value: `${formatLength(units.lengthValue(m.emittingAreaCm.width))} × ${formatLength(units.lengthValue(m.emittingAreaCm.height))} ${units.length}`,
            },
            { term: 'LEDs', value: m.ledCount === null ? '—' : formatCount(m.ledCount) },
            {
              term: 'Nominal wavelengths',
              value: m.nominalWavelengths.length
                ? m.nominalWavelengths.map((w) => `${formatLength(w.nm)} nm${w.sharePct === null ? '' : ` (${formatTick(w.sharePct)} %)`}`).join(', ')
                : 'not stated',
            },
            ...(m.powerW === null ? [] : [{ term: 'Stated power', value: `${formatTick(m.powerW)} W` }]),
            { term: 'Price', value: m.price ? formatMoney(m.price.amountMinor, m.price.currency) : '—' },
            {
              term: 'Who paid for the test',
              value: (
                <>
                  {fundingText(report.funding)}. <Link to="/independence">Who pays for our tests</Link>
                </>
              ),
            },
          ]}
        />
        <div className="space-y-6">
          {instruments.map((i) => (
            <Facts key={i.serial} label={instruments.length > 1 ? `Instrument ${i.serial}` : 'The instrument'} items={instrumentFacts(i)} />
          ))}
        </div>
      </div>

      <ScrollRegion label="Units measured, scrollable">
        <table className="w-full border-collapse">
          <caption className={caption}>{report.units.length > 1 ? `The ${report.units.length} units measured` : 'The unit measured'}</caption>
          <thead>
            <tr>
              <th scope="col" className={th}>Serial</th>
              <th scope="col" className={th}>How we obtained it</th>
              <th scope="col" className={th}>Received</th>
              <th scope="col" className={th}>Measured</th>
              <th scope="col" className={th}>Firmware</th>
            </tr>
          </thead>
          <tbody>
            {report.units.map((u) => (
              <tr key={u.serial}>
                <th scope="row" className={thRow}>{u.serial}</th>
                <td className={td}>{obtainedLabel(u.obtained)}</td>
                <td className={td}>{u.receivedOn ? formatDay(u.receivedOn) : '—'}</td>
                <td className={td}>
                  {formatDay(u.measuredOn)} <span className="text-ink-soft">by {u.measuredBy}</span>
                </td>
                <td className={td}>{orDash(u.firmware)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </ScrollRegion>

      <div className="grid gap-8 lg:grid-cols-2">
        <Facts
          label="The grid"
          items={[
            { term: 'Distances', value: `${lengths(g.distancesCm)}, from the emitting surface` },
            { term: 'Across (x)', value: `${g.xCm.length} positions, ${span(g.xCm)}: ${lengths(g.xCm)}` },
            { term: 'Up (y)', value: `${g.yCm.length} positions, ${span(g.yCm)}: ${lengths(g.yCm)}` },
            { term: 'Readings', value: `${formatCount(g.xCm.length * g.yCm.length)} per distance and unit; the origin is the centre of the emitting area` },
          ]}
        />
        <div className="space-y-6">
          <Facts
            label="Bands and conditions"
            items={[
              ...bands.map(([key, b]) => ({ term: bandName(key), value: `${formatLength(b.loNm)}–${formatLength(b.hiNm)} nm` })),
              {
                term: 'Room temperature',
                value: conditions?.roomTempC === null || conditions?.roomTempC === undefined ? '—' : `${formatTick(conditions.roomTempC)} °C`,
              },
              { term: 'Warm-up', value: conditions?.warmupMinutes === null || conditions?.warmupMinutes === undefined ? '—' : `${formatCount(conditions.warmupMinutes)} minutes` },
              { term: 'Mains voltage', value: conditions?.mainsVoltageV === null || conditions?.mainsVoltageV === undefined ? '—' : `${formatCount(conditions.mainsVoltageV)} V` },
            ]}
          />
          <p className="max-w-measure font-sans text-sm text-ink-soft">
            The split into red and near-infrared is a working convention in light-therapy writing, not a standard: optical
            safety standards draw other lines (visible 380–780 nm, IR-A 780–1400 nm).
            {range && bandTop !== null && range.to < bandTop
              ? ` The instrument reads up to ${formatLength(range.to)} nm, so any light from there to ${formatLength(bandTop)} nm is not counted.`
              : ''}
          </p>
        </div>
      </div>

      <div className="max-w-measure space-y-2">
        <h3 className="text-lg font-semibold">The method in brief</h3>
        <p>
          With the unit warmed up and facing the instrument square on, we measure the spectral irradiance at every grid
          point at each distance, with a cosine-corrected head, and integrate it over each band. Between the points the
          irradiance is interpolated linearly and never extrapolated beyond them; isolines mark 80, 50 and 25 % of each
          plane's peak, and spread widths are read along the centre row. Dose times are the target dose divided by the
          measured irradiance. Every formula, its source and what the numbers do not say are in{' '}
          <Link to="/methodology">the methodology</Link>.
        </p>
      </div>
    </ReportSection>
  );
}
