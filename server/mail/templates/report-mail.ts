import { keyFigureRows, figure, type KeyFiguresLike } from './figures-text.ts';
import { CAUTION_LINE, button, escapeHtml, frame, listHeaders, paragraph, type ComposedMail, type ReaderLinks } from './layout.ts';

export interface ReportMailInput {
  kind: 'new_report' | 'report_correction';
  title: string;
  summary: string;
  makerModel: string;
  version: number;
  changeNote: string | null;
  reportUrl: string;
  keyFigures: KeyFiguresLike;
  /** The coverage picture, attached inline; null when the report has no plane to draw. */
  coverage: { png: Buffer; width: number; height: number; distanceCm: number; peakMwCm2: number } | null;
  topicsText: string;
  reader: ReaderLinks;
}

const COVERAGE_CID = 'coverage@benchlight';

/** A new report, or a correction of one, with its key figures, coverage picture and the cautions. */
export function reportMail(i: ReportMailInput): ComposedMail {
  const correction = i.kind === 'report_correction';
  const subject = correction ? `Corrected: ${i.title} (version ${i.version})` : `New report: ${i.title}`;
  const rows = keyFigureRows(i.keyFigures);
  const figuresHtml = rows.length
    ? `<table role="presentation" style="border-collapse:collapse;margin:0 0 16px;font-family:Arial,Helvetica,sans-serif;font-size:14px">${rows
        .map(([k, v]) => `<tr><td style="padding:4px 16px 4px 0;color:#3b4047">${escapeHtml(k)}</td><td style="padding:4px 0;font-weight:bold">${escapeHtml(v)}</td></tr>`)
        .join('')}</table>`
    : paragraph('This report has no key figures to show here; the report page has every figure.');
  const coverageAlt = i.coverage
    ? `Coverage at ${figure(i.coverage.distanceCm)} cm: irradiance across the measured area relative to its peak of ${figure(i.coverage.peakMwCm2)} mW/cm², from pale (no light) to dark (the peak); the emitting area is outlined.`
    : '';
  const coverageHtml = i.coverage
    ? `<p style="margin:0 0 6px;font-family:Arial,Helvetica,sans-serif;font-size:14px;font-weight:bold">Coverage at ${escapeHtml(figure(i.coverage.distanceCm))} cm</p>
<img src="cid:${COVERAGE_CID}" width="${i.coverage.width}" height="${i.coverage.height}" alt="${escapeHtml(coverageAlt)}" style="display:block;border:1px solid #d6cdbb;margin:0 0 6px">
<p style="margin:0 0 16px;font-family:Arial,Helvetica,sans-serif;font-size:12px;color:#595e66">Pale: no light · dark: the peak (${escapeHtml(figure(i.coverage.peakMwCm2))} mW/cm²). The outline is the emitting area.</p>`
    : '';
  const noteHtml = correction && i.changeNote ? `<p style="margin:0 0 14px;padding:8px 12px;border-left:4px solid #7a5300;background:#f6ead0"><strong>What changed:</strong> ${escapeHtml(i.changeNote)}</p>` : '';
  const bodyHtml = `<h1 style="margin:0 0 8px;font-size:24px;line-height:1.25">${escapeHtml(i.title)}</h1>
<p style="margin:0 0 16px;color:#595e66;font-family:Arial,Helvetica,sans-serif;font-size:14px">${escapeHtml(i.makerModel)} · ${correction ? `corrected, version ${i.version}` : 'new report'}</p>
${noteHtml}${paragraph(i.summary)}
<h2 style="margin:20px 0 8px;font-size:18px">Key figures</h2>
${figuresHtml}${coverageHtml}
<p style="margin:0 0 14px;padding:8px 12px;border-left:4px solid #7a5300;font-size:14px">${escapeHtml(CAUTION_LINE)}</p>
${button(i.reportUrl, 'Read the full report')}`;
  const bodyText = [
    i.title,
    `${i.makerModel} · ${correction ? `corrected, version ${i.version}` : 'new report'}`,
    '',
    ...(correction && i.changeNote ? [`What changed: ${i.changeNote}`, ''] : []),
    i.summary,
    '',
    'Key figures',
    ...(rows.length ? rows.map(([k, v]) => `- ${k}: ${v}`) : ['(none; the report page has every figure)']),
    ...(i.coverage ? ['', coverageAlt] : []),
    '',
    CAUTION_LINE,
    '',
    `Read the full report: ${i.reportUrl}`,
  ].join('\n');
  const { html, text } = frame({
    title: subject,
    bodyHtml,
    bodyText,
    why: `You get this because you subscribed to Benchlight reports (${i.topicsText}${correction ? ', with corrections' : ''}).`,
    reader: i.reader,
  });
  return {
    subject,
    html,
    text,
    headers: listHeaders(i.reader),
    attachments: i.coverage ? [{ filename: 'coverage.png', content: i.coverage.png, contentType: 'image/png', cid: COVERAGE_CID }] : [],
  };
}
