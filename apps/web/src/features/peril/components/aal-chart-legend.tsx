/**
 * The key to the projected-AAL chart's marks, drawn with the same shapes and colours as the
 * plot so each entry can be matched by eye. Today's entry only when the chart has today's AAL.
 */
export function AalChartLegend({ color, withToday }: { color: string; withToday: boolean }) {
  const item = "flex items-center gap-1.5";
  return (
    <ul aria-label="Legend" className="flex flex-wrap gap-x-5 gap-y-1 text-xs text-muted">
      <li className={item}>
        <svg aria-hidden width="14" height="14" viewBox="0 0 14 14">
          <circle cx="7" cy="7" r="4.5" fill={color} stroke="var(--pl-surface)" strokeWidth="1.5" />
        </svg>
        Median (50th pct)
      </li>
      <li className={item}>
        <svg aria-hidden width="14" height="14" viewBox="0 0 14 14">
          <rect x="3" y="1" width="8" height="12" rx="1.5" fill={color} fillOpacity="0.3" stroke={color} />
        </svg>
        17th–83rd pct
      </li>
      <li className={item}>
        <svg aria-hidden width="14" height="14" viewBox="0 0 14 14">
          <path d="M4 1.5h6M7 1.5v11M4 12.5h6" stroke={color} strokeWidth="1.5" fill="none" />
        </svg>
        5th–95th pct
      </li>
      {withToday && (
        <li className={item}>
          <svg aria-hidden width="22" height="14" viewBox="0 0 22 14">
            <path d="M0 7h22" stroke="var(--pl-ink)" strokeOpacity="0.45" strokeDasharray="3 2" />
            <rect x="6.5" y="2.5" width="9" height="9" fill="var(--pl-surface)" stroke="var(--pl-ink)" strokeWidth="1.5" />
          </svg>
          Today's AAL (portfolio baseline)
        </li>
      )}
    </ul>
  );
}
