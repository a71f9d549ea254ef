import type { ReactNode } from 'react';
import type { PublicReport } from '#shared/schemas/reports.ts';
import { ClaimsSection } from './claims-section.tsx';
import { CoverageSection } from './coverage-section.tsx';
import { DoseSection } from './dose-section.tsx';
import { HistorySection } from './history-section.tsx';
import { ProfileSection } from './profile-section.tsx';
import { REPORT_SECTIONS, ReportContents } from './report-section.tsx';
import { ReportHeader } from './report-header.tsx';
import { SafetySection } from './safety-section.tsx';
import { SpectrumSection } from './spectrum-section.tsx';
import { UnitSection } from './unit-section.tsx';
import { UnitSpreadSection } from './unit-spread-section.tsx';
import { WriteUp } from './write-up.tsx';

/**
 * One published version of a report, whole: the public page and the staff preview both draw
 * exactly this (a preview says so in a banner, from `report.preview`). `planner` is the session
 * planner, composed by the page (another feature), drawn after the dose table.
 */
export function ReportView({ report, planner }: { report: PublicReport; planner?: ReactNode }) {
  const ids = REPORT_SECTIONS.map((s) => s.id).filter(
    (id) =>
      (id !== 'write-up' || report.bodyHtml.trim() !== '') &&
      (id !== 'spread' || (report.unitSpread?.length ?? 0) > 0) &&
      (id !== 'planner' || Boolean(planner)),
  );
  return (
    <article className="space-y-10" data-report-version={report.version}>
      <ReportHeader report={report} />
      <ReportContents ids={ids} />
      <WriteUp html={report.bodyHtml} />
      <UnitSection report={report} />
      <ClaimsSection report={report} />
      <CoverageSection report={report} />
      <ProfileSection report={report} />
      <SpectrumSection report={report} />
      <DoseSection report={report} />
      {planner ? (
        <div id="planner" className="scroll-mt-6 border-t border-rule pt-8">
          {planner}
        </div>
      ) : null}
      <SafetySection report={report} />
      <UnitSpreadSection report={report} />
      <HistorySection report={report} />
    </article>
  );
}
