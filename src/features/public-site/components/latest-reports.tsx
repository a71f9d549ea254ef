import { Link } from 'react-router-dom';

/** The home page's list of new reports. None are published yet, so it says so. */
export function LatestReports() {
  return (
    <section aria-labelledby="latest-reports" className="space-y-3">
      <h2 id="latest-reports" className="text-xl font-semibold">
        Latest reports
      </h2>
      <div className="rounded-md border border-dashed border-rule-strong bg-paper-raised px-6 py-8 text-center">
        <p className="text-lg font-semibold">No reports published yet</p>
        <p className="mt-1 text-ink-soft">
          The first units are on the bench. <Link to="/subscribe">Get an e-mail</Link> when a report is out, or{' '}
          <Link to="/request">ask us to test a device</Link>.
        </p>
      </div>
    </section>
  );
}
