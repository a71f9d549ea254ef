import { Router } from 'express';
import { publicBaseUrl } from '../http/public-url.ts';
import type { Services } from '../services/index.ts';

const xml = (s: string) => s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');

/** /feed.xml (Atom: each publication and correction an entry), /sitemap.xml, /robots.txt. */
export function siteRoutes(s: Pick<Services, 'publicReports'>, opts: { publicBaseUrl?: string }): Router {
  const router = Router();

  router.get('/feed.xml', async (req, res) => {
    const base = publicBaseUrl(req, opts.publicBaseUrl);
    const entries = await s.publicReports.feedEntries();
    const updated = entries[0]?.version.publishedAt ?? new Date(0).toISOString();
    const body = [
      '<?xml version="1.0" encoding="utf-8"?>',
      '<feed xmlns="http://www.w3.org/2005/Atom">',
      '  <title>Benchlight reports</title>',
      '  <subtitle>Independent measurements of LED light-therapy devices</subtitle>',
      `  <id>${xml(base)}/</id>`,
      `  <link rel="self" href="${xml(base)}/feed.xml"/>`,
      `  <link rel="alternate" href="${xml(base)}/reports"/>`,
      `  <updated>${updated}</updated>`,
      '  <author><name>Benchlight test lab</name></author>',
      ...entries.map(({ slug, status, version: v }) => {
        const url = `${base}/reports/${slug}/versions/${v.version}`;
        const kind = v.version === 1 ? 'Published' : `Corrected (version ${v.version})`;
        return [
          '  <entry>',
          `    <title>${xml(v.version === 1 ? v.title : `${v.title} (version ${v.version})`)}</title>`,
          `    <id>${xml(url)}</id>`,
          `    <link rel="alternate" href="${xml(url)}"/>`,
          `    <updated>${v.publishedAt}</updated>`,
          `    <summary>${xml(`${kind}${status === 'retracted' ? ', since retracted' : ''}. ${v.changeNote ? `${v.changeNote} ` : ''}${v.summary}`)}</summary>`,
          '  </entry>',
        ].join('\n');
      }),
      '</feed>',
      '',
    ].join('\n');
    res.setHeader('Cache-Control', 'public, max-age=300');
    res.type('application/atom+xml; charset=utf-8').send(body);
  });

  router.get('/sitemap.xml', async (req, res) => {
    const base = publicBaseUrl(req, opts.publicBaseUrl);
    const reports = await s.publicReports.sitemapEntries();
    const urls = [
      { loc: `${base}/`, lastmod: reports[0]?.version.publishedAt },
      { loc: `${base}/reports`, lastmod: reports[0]?.version.publishedAt },
      { loc: `${base}/compare` },
      { loc: `${base}/methodology` },
      ...reports.map((r) => ({ loc: `${base}/reports/${r.report.slug}`, lastmod: r.version.publishedAt })),
    ];
    const body = [
      '<?xml version="1.0" encoding="UTF-8"?>',
      '<urlset xmlns="http://www.sitemaps.org/schemas/sitemap/0.9">',
      ...urls.map((u) => `  <url><loc>${xml(u.loc)}</loc>${u.lastmod ? `<lastmod>${u.lastmod.slice(0, 10)}</lastmod>` : ''}</url>`),
      '</urlset>',
      '',
    ].join('\n');
    res.setHeader('Cache-Control', 'public, max-age=300');
    res.type('application/xml; charset=utf-8').send(body);
  });

  router.get('/robots.txt', (req, res) => {
    res.type('text/plain').send(`User-agent: *\nDisallow: /lab\nDisallow: /api/lab\nSitemap: ${publicBaseUrl(req, opts.publicBaseUrl)}/sitemap.xml\n`);
  });

  return router;
}
