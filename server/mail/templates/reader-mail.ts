import { button, escapeHtml, frame, listHeaders, paragraph, type ComposedMail, type ReaderLinks } from './layout.ts';

/** The double opt-in: nothing is sent to the address until its owner confirms here. */
export function subscriptionConfirmMail(i: { confirmUrl: string; topicsText: string; corrections: boolean; expiresHours: number; reader: ReaderLinks }): ComposedMail {
  const subject = 'Confirm your Benchlight subscription';
  const choice = `${i.topicsText}${i.corrections ? ', and corrections to them' : ''}`;
  const { html, text } = frame({
    title: subject,
    bodyHtml: `<h1 style="margin:0 0 12px;font-size:22px">Confirm your subscription</h1>
${paragraph(`Someone, probably you, asked to get an e-mail from Benchlight whenever we publish a report: ${choice}.`)}
${paragraph('Open the link and press “Confirm” to start. If it was not you, ignore this e-mail: nothing will be sent.')}
${button(i.confirmUrl, 'Confirm my subscription')}
${paragraph(`The link works for ${i.expiresHours} hours and once.`)}`,
    bodyText: `Confirm your subscription

Someone, probably you, asked to get an e-mail from Benchlight whenever we publish a report: ${choice}.

Open this link and press "Confirm" to start (it works for ${i.expiresHours} hours and once):
${i.confirmUrl}

If it was not you, ignore this e-mail: nothing will be sent.`,
    why: 'You get this because this address was entered on Benchlight’s subscribe page.',
    reader: i.reader,
  });
  return { subject, html, text, headers: listHeaders(i.reader) };
}

/** A vote (or a new request, whose first vote is the requester's) counts once confirmed here. */
export function voteConfirmMail(i: { confirmUrl: string; device: string; newRequest: boolean; notify: boolean; expiresHours: number; reader: ReaderLinks }): ComposedMail {
  const subject = i.newRequest ? `Confirm your test request: ${i.device}` : `Confirm your vote: ${i.device}`;
  const what = i.newRequest ? `asked Benchlight to test the ${i.device}` : `voted for testing the ${i.device}`;
  const after = i.notify ? ' We will also e-mail you when its report is out.' : '';
  const { html, text } = frame({
    title: subject,
    bodyHtml: `<h1 style="margin:0 0 12px;font-size:22px">${i.newRequest ? 'Confirm your test request' : 'Confirm your vote'}</h1>
${paragraph(`Someone, probably you, ${what}. It counts once you confirm.${after}`)}
${button(i.confirmUrl, i.newRequest ? 'Confirm my request' : 'Confirm my vote')}
${paragraph(`The link works for ${i.expiresHours} hours and once. If it was not you, ignore this e-mail.`)}`,
    bodyText: `${i.newRequest ? 'Confirm your test request' : 'Confirm your vote'}

Someone, probably you, ${what}. It counts once you confirm.${after}

Confirm here (the link works for ${i.expiresHours} hours and once):
${i.confirmUrl}

If it was not you, ignore this e-mail.`,
    why: 'You get this because this address was entered on Benchlight’s “Request a test” page.',
    reader: i.reader,
  });
  return { subject, html, text, headers: listHeaders(i.reader) };
}

/** To a voter or a backer who asked to hear: the requested device has a published report. */
export function requestTestedMail(i: { device: string; as: 'voter' | 'backer'; reportTitle: string; reportUrl: string; reader: ReaderLinks }): ComposedMail {
  const subject = `Tested: ${i.device}`;
  const what = i.as === 'backer' ? `You helped pay for testing the ${i.device}.` : `You voted for testing the ${i.device}.`;
  const { html, text } = frame({
    title: subject,
    bodyHtml: `<h1 style="margin:0 0 12px;font-size:22px">We tested the ${escapeHtml(i.device)}</h1>
${paragraph(`${what} Its report is out: “${i.reportTitle}”.`)}
${button(i.reportUrl, 'Read the report')}
${paragraph('Results are measurements of devices, not treatment advice; the report prints the cautions beside every figure.')}`,
    bodyText: `We tested the ${i.device}

${what} Its report is out: "${i.reportTitle}".

Read the report: ${i.reportUrl}

Results are measurements of devices, not treatment advice; the report prints the cautions beside every figure.`,
    why:
      i.as === 'backer'
        ? 'You get this because you pledged toward this test request and asked to hear when it is tested.'
        : 'You get this because you voted for this test request and asked to hear when it is tested.',
    reader: i.reader,
  });
  return { subject, html, text, headers: listHeaders(i.reader) };
}
