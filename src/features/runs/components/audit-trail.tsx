import type { AuditEvent } from '#shared/schemas/runs.ts';
import { formatDate } from '#src/lib/format.ts';

const ACTION_TEXT: Record<string, string> = {
  'run.create': 'created the run',
  'run.update': 'changed the run',
  'run.upload': 'uploaded files',
  'run.submit': 'submitted it',
  'run.request_changes': 'requested changes',
  'run.approve': 'approved it',
  'run.comment': 'commented',
  'reading.exclude': 'excluded a reading',
  'reading.include': 'included a reading again',
};

const time = new Intl.DateTimeFormat('en-GB', { hour: '2-digit', minute: '2-digit' });

/** Every step of the run, in order: who, when, from which state to which, and the note. */
export function AuditTrail({ events }: { events: readonly AuditEvent[] }) {
  return (
    <div role="region" aria-labelledby="audit-caption" tabIndex={0} className="overflow-x-auto">
      <table className="w-full border-collapse text-left text-sm">
        <caption id="audit-caption" className="pb-2 text-left text-xl font-semibold">
          Audit trail
        </caption>
        <thead>
          <tr className="border-b border-rule">
            <th scope="col" className="bl-label py-1.5 pr-4">When</th>
            <th scope="col" className="bl-label py-1.5 pr-4">Who</th>
            <th scope="col" className="bl-label py-1.5 pr-4">What</th>
            <th scope="col" className="bl-label py-1.5 pr-4">State</th>
            <th scope="col" className="bl-label py-1.5">Note</th>
          </tr>
        </thead>
        <tbody>
          {events.map((e, i) => (
            <tr key={i} className="border-b border-rule last:border-b-0 align-top">
              <td className="py-1.5 pr-4 whitespace-nowrap">
                <time dateTime={e.at}>
                  {formatDate(e.at)} {time.format(new Date(e.at))}
                </time>
              </td>
              <td className="py-1.5 pr-4">{e.actor}</td>
              <th scope="row" className="py-1.5 pr-4 font-normal">{ACTION_TEXT[e.action] ?? e.action}</th>
              <td className="py-1.5 pr-4">{e.from && e.to && e.from !== e.to ? `${e.from.replace('_', ' ')} → ${e.to.replace('_', ' ')}` : ''}</td>
              <td className="py-1.5">{e.note ?? ''}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
