import fs from 'node:fs';
import path from 'node:path';
import { Router, type Request, type Response } from 'express';
import { z } from 'zod';
import { publicBaseUrl } from '../http/public-url.ts';
import { parseWith } from '../http/validate.ts';
import { renderDocument } from '../reports/render-markdown.ts';
import type { Services } from '../services/index.ts';
import type { Rendered } from '../services/rendered-cache.ts';

const slugParams = z.object({ slug: z.string().regex(/^[a-z0-9-]{1,100}$/) });
const versionParams = slugParams.extend({ n: z.coerce.number().int().min(1).max(10000) });

/** Short-lived public caching; Express adds an ETag and answers 304 to a matching If-None-Match. */
function cacheable(res: Response, seconds = 60): void {
  res.setHeader('Cache-Control', `public, max-age=${seconds}`);
}

/** JSON serialised ahead; Express answers 304 itself when If-None-Match matches the ETag set here. */
function sendRendered(res: Response, r: Rendered): void {
  res.setHeader('ETag', r.etag);
  res.type('application/json').send(r.body);
}

/** /api/public/…: read-only, published data only, cacheable. */
export function publicRoutes(s: Pick<Services, 'publicReports'>, opts: { publicBaseUrl?: string; methodologyPath?: string }): Router {
  const router = Router();
  const methodologyFile = opts.methodologyPath ?? path.resolve(import.meta.dirname, '..', '..', 'docs', 'methodology.md');
  let methodology: string | null = null;

  router.get('/public/reports', async (_req, res) => {
    cacheable(res);
    sendRendered(res, await s.publicReports.listRendered());
  });
  router.get('/public/reports/:slug', async (req, res) => {
    const { slug } = parseWith(slugParams, req.params, 'params');
    cacheable(res);
    sendRendered(res, await s.publicReports.getRendered(slug, null, publicBaseUrl(req, opts.publicBaseUrl)));
  });
  router.get('/public/reports/:slug/versions/:n', async (req, res) => {
    const { slug, n } = parseWith(versionParams, req.params, 'params');
    // A version's figures never change once published, but its page shows a later retraction: keep it short too.
    cacheable(res);
    sendRendered(res, await s.publicReports.getRendered(slug, n, publicBaseUrl(req, opts.publicBaseUrl)));
  });
  router.get('/public/reports/:slug/readings.csv', async (req, res) => {
    const { slug } = parseWith(slugParams, req.params, 'params');
    cacheable(res);
    res.setHeader('Content-Type', 'text/csv; charset=utf-8');
    res.setHeader('Content-Disposition', `attachment; filename="${slug}-readings.csv"`);
    res.send(await s.publicReports.readingsCsv(slug, null));
  });
  router.get('/public/reports/:slug/versions/:n/readings.csv', async (req, res) => {
    const { slug, n } = parseWith(versionParams, req.params, 'params');
    cacheable(res, 3600);
    res.setHeader('Content-Type', 'text/csv; charset=utf-8');
    res.setHeader('Content-Disposition', `attachment; filename="${slug}-v${n}-readings.csv"`);
    res.send(await s.publicReports.readingsCsv(slug, n));
  });
  const figures = async (req: Request, res: Response, slug: string, n: number | null) => {
    const r = await s.publicReports.get(slug, n, publicBaseUrl(req, opts.publicBaseUrl));
    cacheable(res);
    res.setHeader('Content-Disposition', `attachment; filename="${slug}${n === null ? '' : `-v${n}`}-figures.json"`);
    res.json({
      report: { slug: r.slug, title: r.title, version: r.version, publishedAt: r.publishedAt, retracted: r.retracted },
      units: {
        irradiance: 'mW/cm² (1 mW/cm² = 10 W/m²)',
        distance: 'cm',
        spreadWidth: 'cm',
        dose: 'J/cm²',
        doseTime: 's',
        spectralIrradiance: 'W/m²/nm',
        uniformity: 'ratio (minOverMean, minOverMax), coefficient of variation (cv, fraction), non-uniformity (%)',
      },
      model: r.model,
      units_measured: r.units,
      instrument: r.instrument,
      bands: r.bands,
      planes: r.planes,
      falloffExponent: r.falloffExponent,
      pointFalloffExponents: r.pointExponents,
      beamAngle: r.beamAngle,
      claims: r.claims,
      doseTable: r.doseTable,
      uncertainty: r.uncertainty,
      irScreening: r.irScreening,
      unitSpread: r.unitSpread,
      keyFigures: r.keyFigures,
      // How the test was paid for: readers' pledges or the lab (read now, not frozen at publication).
      funding: r.funding,
      citation: r.citation,
    });
  };
  router.get('/public/reports/:slug/figures.json', async (req, res) => {
    const { slug } = parseWith(slugParams, req.params, 'params');
    await figures(req, res, slug, null);
  });
  router.get('/public/reports/:slug/versions/:n/figures.json', async (req, res) => {
    const { slug, n } = parseWith(versionParams, req.params, 'params');
    await figures(req, res, slug, n);
  });
  router.get('/public/methodology', (_req, res) => {
    methodology ??= renderDocument(fs.readFileSync(methodologyFile, 'utf8'));
    cacheable(res, 300);
    res.json({ html: methodology });
  });
  return router;
}
