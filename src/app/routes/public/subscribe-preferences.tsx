import { Link, useSearchParams } from 'react-router-dom';
import { LinkProblem } from '#src/components/link-problem.tsx';
import { PageHeader } from '#src/components/page-header.tsx';
import { Spinner } from '#src/components/spinner.tsx';
import { usePreferences } from '#src/features/subscriptions/api/preferences.ts';
import { PreferencesForm } from '#src/features/subscriptions/components/preferences-form.tsx';

export default function SubscribePreferencesRoute() {
  const [params] = useSearchParams();
  const token = params.get('token') ?? '';
  const prefs = usePreferences(token);
  return (
    <>
      <PageHeader eyebrow="Subscribe" title="Your e-mail preferences" />
      {prefs.isPending ? (
        <Spinner label="Loading your choices…" />
      ) : prefs.isError ? (
        <LinkProblem error={prefs.error} again="Use the preferences link of a recent Benchlight e-mail." />
      ) : (
        <div className="space-y-8">
          <PreferencesForm token={token} preferences={prefs.data} />
          <p className="font-sans text-sm">
            <Link to={`/subscribe/unsubscribe?token=${encodeURIComponent(token)}`}>Unsubscribe from everything</Link>
          </p>
        </div>
      )}
    </>
  );
}
