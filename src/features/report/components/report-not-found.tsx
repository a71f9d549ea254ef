import { Link } from 'react-router-dom';
import { PageHeader } from '#src/components/page-header.tsx';

/** Nothing published at this address: a draft, a mistyped slug or a version that does not exist. */
export function ReportNotFound({ version }: { version: number | null }) {
  return (
    <>
      <PageHeader title="No published report here" />
      <div className="max-w-measure space-y-3">
        <p className="text-lg">
          {version === null
            ? 'There is no published report at this address. It may be mistyped, or the report is not out yet.'
            : `This report has no published version ${version}.`}
        </p>
        <p className="font-sans text-sm">
          <Link to="/reports">See every published report</Link>
        </p>
      </div>
    </>
  );
}
