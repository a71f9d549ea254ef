import { useEffect, useRef, useState } from 'react';
import { Link } from 'react-router-dom';
import type { LabReport } from '#shared/schemas/reports.ts';
import { Button } from '#src/components/button.tsx';
import { SaveError } from '#src/components/save-error.tsx';
import { usePublishReport } from '../api/publish-report.ts';

/**
 * Preview, then publish: version 1 goes public at its address with the figures frozen as they are
 * now, and its runs become "published". A second click confirms, since it cannot be undone.
 */
export function PublishPanel({ report, onPublished }: { report: LabReport; onPublished: (report: LabReport) => void }) {
  const publish = usePublishReport(report.id);
  const [confirming, setConfirming] = useState(false);
  const [failure, setFailure] = useState<unknown>(null);
  const question = useRef<HTMLParagraphElement>(null);
  useEffect(() => {
    if (confirming) question.current?.focus();
  }, [confirming]);
  return (
    <div className="space-y-4">
      <p className="max-w-measure text-sm text-ink-soft">
        The preview shows the page exactly as readers will see it, with the figures computed from the approved runs now. Publishing
        freezes those figures; later changes go out as a correction with a note.
      </p>
      <SaveError error={failure} what="The report" />
      <div className="flex flex-wrap items-center gap-3">
        <Link to={`/lab/reports/${report.id}/preview`} className="font-sans text-sm font-semibold">
          Preview the page
        </Link>
        {confirming ? (
          <div role="group" aria-labelledby="publish-confirm" className="flex flex-wrap items-center gap-3">
            <p id="publish-confirm" ref={question} tabIndex={-1} className="w-full font-sans text-sm font-semibold">
              Publish version 1 of “{report.title}” now? Readers can see it at once.
            </p>
            <Button
              pending={publish.isPending}
              onClick={() =>
                publish.mutate(undefined, {
                  onSuccess: (r) => {
                    setConfirming(false);
                    onPublished(r);
                  },
                  onError: setFailure,
                })
              }
            >
              Publish now at /reports/{report.slug}
            </Button>
            <Button variant="secondary" onClick={() => setConfirming(false)}>
              Not yet
            </Button>
          </div>
        ) : (
          <Button
            onClick={() => {
              setFailure(null);
              setConfirming(true);
            }}
          >
            Publish…
          </Button>
        )}
      </div>
    </div>
  );
}
