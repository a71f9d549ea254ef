import { Link } from 'react-router-dom';
import { ROLE_CAPABILITIES, ROLE_LABELS, type Capability, type Role } from '../../../../shared/auth/capabilities.ts';

/** One sentence per capability, in the lab's words. */
const CAPABILITY_TEXT: Record<Capability, string> = {
  'lab.enter': 'Use the staff area.',
  'catalog.manage': 'Keep the catalog: makers, models, units and instruments with their calibration records.',
  'runs.create': 'Create runs: one unit, one instrument, one grid of distances and positions.',
  'runs.upload': 'Upload spectroradiometer and meter exports to a run, fix them and resubmit.',
  'runs.review': 'Review submitted runs: request changes or approve (never a run you measured).',
  'reports.publish': 'Publish reports, and correct or retract them with a note.',
  'users.manage': 'Add staff, set their roles, deactivate and reactivate accounts.',
  'settings.manage': 'Change site settings.',
};

export function RoleOverview({ displayName, role }: { displayName: string; role: Role }) {
  return (
    <div className="grid gap-8 lg:grid-cols-[2fr_1fr]">
      <section aria-labelledby="role-can" className="max-w-measure">
        <h2 id="role-can" className="text-xl font-semibold">
          As {/^[aeiou]/i.test(ROLE_LABELS[role]) ? 'an' : 'a'} {ROLE_LABELS[role]}, you can
        </h2>
        <ul className="mt-3 list-disc space-y-1.5 pl-6 marker:text-signal">
          {ROLE_CAPABILITIES[role]
            .filter((c) => c !== 'lab.enter')
            .map((c) => (
              <li key={c}>{CAPABILITY_TEXT[c]}</li>
            ))}
        </ul>
      </section>
      <aside aria-labelledby="start-here" className="rounded-md border border-rule bg-paper-raised p-5">
        <h2 id="start-here" className="bl-label">
          Start here
        </h2>
        <p className="mt-2 text-sm text-ink-soft">
          Welcome back, {displayName}. Runs and the catalog are being built; their pages say what they will hold.
        </p>
        <p className="mt-3 font-sans text-sm">
          <Link to="/lab/runs">Go to runs</Link>
        </p>
      </aside>
    </div>
  );
}
