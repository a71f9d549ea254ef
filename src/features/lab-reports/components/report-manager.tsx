import { useState, type ReactNode } from 'react';
import type { LabReport } from '#shared/schemas/reports.ts';
import { Alert } from '#src/components/alert.tsx';
import { LiveMessage, type LiveMessageValue } from '#src/components/live-message.tsx';
import { CorrectionForm } from './correction-form.tsx';
import { DraftForm } from './draft-form.tsx';
import { PublishPanel } from './publish-panel.tsx';
import { ReportOverview } from './report-overview.tsx';
import { RetractForm } from './retract-form.tsx';

function Section({ id, title, children }: { id: string; title: string; children: ReactNode }) {
  return (
    <section aria-labelledby={id} className="space-y-4 rounded-md border border-rule bg-paper-raised px-5 py-4 shadow-sheet">
      <h2 id={id} className="text-xl font-semibold">
        {title}
      </h2>
      {children}
    </section>
  );
}

/**
 * One report for staff: where it stands, and the steps its state allows — a draft is edited,
 * previewed and published; a published report is corrected (a new version with a note) or
 * retracted (with a reason). Only a role that may publish sees the steps; the server decides.
 */
export function ReportManager({ report, canPublish, created = false }: { report: LabReport; canPublish: boolean; created?: boolean }) {
  const [message, setMessage] = useState<LiveMessageValue | null>(
    created ? { tone: 'success', text: 'Draft created. Nothing is public until you publish it.' } : null,
  );
  return (
    <div className="space-y-8">
      <LiveMessage message={message} />
      {report.status === 'retracted' ? (
        <Alert tone="warning" live={false} title="Retracted">
          {report.retractionReason}
        </Alert>
      ) : null}
      <Section id="overview-heading" title="Overview">
        <ReportOverview report={report} />
      </Section>
      {!canPublish ? (
        <p className="font-sans text-sm text-ink-soft">Publishing, corrections and retractions are an editor's steps.</p>
      ) : report.status === 'draft' ? (
        <>
          <Section id="draft-heading" title="Title, summary and write-up">
            <DraftForm report={report} onSaved={() => setMessage({ tone: 'success', text: 'Draft saved.' })} />
          </Section>
          <Section id="publish-heading" title="Preview and publish">
            <PublishPanel
              report={report}
              onPublished={(r) => setMessage({ tone: 'success', text: `Published: version ${r.version} is public at /reports/${r.slug}.` })}
            />
          </Section>
        </>
      ) : report.status === 'published' ? (
        <>
          <Section id="correction-heading" title="Publish a correction">
            <CorrectionForm
              key={report.version}
              report={report}
              onCorrected={(r) => setMessage({ tone: 'success', text: `Version ${r.version} published with its change note; earlier versions stay readable.` })}
            />
          </Section>
          <Section id="retract-heading" title="Retract">
            <RetractForm report={report} onRetracted={() => setMessage({ tone: 'success', text: 'Retracted: the page now carries the banner and your reason.' })} />
          </Section>
        </>
      ) : null}
    </div>
  );
}
