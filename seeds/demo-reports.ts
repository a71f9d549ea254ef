/**
 * The demo's public site: reports over the approved demo runs, written and published through the
 * reports service — one over two units of a model, one corrected after publication, one
 * retracted, so a newcomer sees a living site. The write-ups are fictional.
 */
import { systemCaller, type Caller } from '#server/core/caller.ts';
import type { Services } from '#server/services/index.ts';

const CAUTION =
  'These are measurements of one device on our bench, not treatment advice. Protect your eyes, mind the heat at short distances, ' +
  'ask a clinician if you take photosensitising medicines, and follow local rules and licensed practice.';

interface DemoReport {
  units: string[];
  title: string;
  summary: string;
  body: string;
  then?: { correct: { changeNote: string; body: string } } | { retract: string };
}

const REPORTS: DemoReport[] = [
  {
    units: ['corvane-fenwick', 'corvane-fenwick-b'],
    title: 'Corvane Fenwick torso panel: two units, broad and even at 30 cm',
    summary:
      'Two retail units of the 80 × 34 cm torso panel measured at 15, 30 and 60 cm. The light falls off far more slowly than the inverse-square law close up, and the two units agree within a few per cent.',
    body: `## What we tested

Two units bought at retail, six weeks apart, each measured on the standard 9 × 5 grid at 15, 30 and 60 cm with a calibrated spectroradiometer.

## What we found

- At 15 cm the centre reads about 80 mW/cm²; at 30 cm the 50 % region is wider than the emitting area itself.
- The maker's "> 150 mW/cm² at the surface" cannot be checked: we do not measure in contact or extrapolate to it.
- The fitted effective beam angle is about twice the 30° printed on the box.

${CAUTION}`,
  },
  {
    units: ['aldermoor-tarn'],
    title: 'Aldermoor Tarn hand panel: a small, bright spot',
    summary: 'A 30 × 20 cm hand panel with a narrow beam: bright at the centre at 15 cm, with a 50 % region little wider than the panel.',
    body: `## What we tested

One unit, measured at 15, 30 and 60 cm on the standard grid.

## What we found

The centre at 15 cm reads below the claimed 75 mW/cm². The light is concentrated: move the panel to cover a larger area.

${CAUTION}`,
    then: {
      correct: {
        changeNote: 'Corrected the write-up: the claim is compared at 15 cm, where it was stated, not at 30 cm.',
        body: `## What we tested

One unit, measured at 15, 30 and 60 cm on the standard grid.

## What we found

The centre at 15 cm — the distance the maker's 75 mW/cm² is stated at — reads below the claim (see "Claims against measurements"). The light is concentrated: move the panel to cover a larger area.

${CAUTION}`,
      },
    },
  },
  {
    units: ['norrow-holt'],
    title: 'Norrow & Vale Holt half-body panel: wide lenses, wide coverage',
    summary: 'A 45 × 30 cm panel with wide lenses: the irradiance at the centre is moderate, the coverage at 30 cm generous.',
    body: `## What we found

The printed "60° lenses" fits the measured profiles only loosely: the fitted effective beam angle is wider.

${CAUTION}`,
  },
  {
    units: ['quenby-mere'],
    title: 'Quenby Mere wrap mat: low irradiance, even spread',
    summary: 'A flexible 60 × 30 cm mat measured flat on the bench.',
    body: `## What we found

Low irradiance and an even spread over the mat's area.

${CAUTION}`,
    then: {
      retract:
        'The mat was measured flat, but it is sold to be wrapped around a limb; the figures do not describe its use. A new test with a curved fixture is planned.',
    },
  },
];

export async function seedDemoReports(services: Services, approvedRuns: ReadonlyMap<string, string>, editor: Caller): Promise<void> {
  if ((await services.reports.list(systemCaller('seed'))).length > 0) return;
  for (const r of REPORTS) {
    const runIds = r.units.map((u) => approvedRuns.get(u)).filter((id): id is string => Boolean(id));
    if (runIds.length !== r.units.length) continue;
    const report = await services.reports.create(editor, { runIds, title: r.title, summary: r.summary, bodyMarkdown: r.body });
    await services.reports.publish(editor, report.id);
    if (r.then && 'correct' in r.then) await services.reports.correct(editor, report.id, { changeNote: r.then.correct.changeNote, bodyMarkdown: r.then.correct.body });
    if (r.then && 'retract' in r.then) await services.reports.retract(editor, report.id, r.then.retract);
  }
}
