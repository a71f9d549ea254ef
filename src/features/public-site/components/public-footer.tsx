import { Link } from 'react-router-dom';
import { Cautions } from '#src/components/cautions.tsx';

export function PublicFooter() {
  return (
    <footer className="mt-section border-t border-rule bg-paper-sunk">
      <div className="mx-auto max-w-page space-y-6 px-gutter py-8">
        <div id="site-cautions" tabIndex={-1}>
          <Cautions title="Cautions for anyone using these devices" />
        </div>
        <p className="max-w-measure text-sm text-ink-soft">
          Benchlight publishes measurements, not medical advice.
        </p>
        <p className="font-sans text-xs text-ink-muted">
          Benchlight · an independent test lab · <Link to="/methodology">How we measure</Link> · <Link to="/independence">Who pays for our tests</Link>
        </p>
      </div>
    </footer>
  );
}
