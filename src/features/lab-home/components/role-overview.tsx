import { ROLE_CAPABILITIES, ROLE_LABELS, type Capability, type Role } from '#shared/auth/capabilities.ts';

/** One sentence per capability, in the lab's words. */
const CAPABILITY_TEXT: Record<Capability, string> = {
  'lab.enter': 'Use the staff area.',
  'catalog.manage': 'Keep the catalog: makers, models, units and instruments with their calibration records.',
  'runs.create': 'Create runs: one unit, one instrument, one grid of distances and positions.',
  'runs.upload': 'Upload spectroradiometer and meter exports to a run, fix them and resubmit.',
  'runs.review': 'Review submitted runs: request changes or approve (never a run you measured).',
  'reports.publish': 'Publish reports, and correct or retract them with a note.',
  'users.manage': 'Invite staff, set their roles, deactivate and reactivate accounts.',
  'requests.triage': 'Triage readers’ test requests: set a funding goal, plan, decline with a reason (pledges are refunded), mark tested with the report, merge near-duplicates.',
  'mail.manage': 'Read the send log of every e-mail, send a failed one again, and open the demo mailbox.',
  'settings.manage': 'Change site settings.',
  'ledger.read': 'Read the ledger of readers’ payments, refunds and fees, export it, and reconcile it with the payment provider’s balance.',
};

export function RoleOverview({ role }: { role: Role }) {
  return (
    <div className="space-y-6">
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
      <p className="max-w-measure text-ink-soft">
        Use the sections in the Lab menu above. Most are still being built; each page says what it will hold.
      </p>
    </div>
  );
}
