import { PageHeader } from '#src/components/page-header.tsx';
import { MeterCheckSection } from '#src/features/file-check/components/meter-check-section.tsx';
import { SpectrumCheckSection } from '#src/features/file-check/components/spectrum-check-section.tsx';

/** Instrument files checked before upload, entirely in the browser (no loader: nothing to fetch). */
export default function FileCheckRoute() {
  return (
    <>
      <PageHeader
        eyebrow="Lab"
        title="File check"
        description={
          <>
            <p>
              See how Benchlight reads a spectroradiometer export or a meter-readings file before you upload it to a
              run: the unit it finds, the figures it gives and every problem, line by line.
            </p>
            <p className="mt-2 font-sans text-base font-semibold text-ink">
              Files are read in your browser; nothing is uploaded.
            </p>
          </>
        }
      />
      <div className="space-y-section">
        <SpectrumCheckSection />
        <hr className="border-rule" />
        <MeterCheckSection />
      </div>
    </>
  );
}
