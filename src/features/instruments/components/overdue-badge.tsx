/** "Calibration overdue" in words and a mark, not in colour alone. */
export function OverdueBadge() {
  return (
    <span className="inline-flex items-center gap-1 rounded-sm border border-danger bg-danger-tint px-1.5 py-0.5 font-sans text-xs font-semibold text-danger">
      <span aria-hidden="true">⚠</span>
      Calibration overdue
    </span>
  );
}
