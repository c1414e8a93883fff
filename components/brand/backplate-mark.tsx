/** Backplate's mark: a perforated backplate disc seen face-on, with a brass rim. */
export function BackplateMark({ className = "h-7 w-7" }: { className?: string }) {
  const holes = [
    [16, 9],
    [10, 13],
    [22, 13],
    [16, 16],
    [10, 19],
    [22, 19],
    [16, 23],
  ];
  return (
    <svg viewBox="0 0 32 32" className={className} aria-hidden="true">
      <circle cx="16" cy="16" r="14.5" fill="var(--color-graphite)" stroke="var(--color-brass)" strokeWidth="2.5" />
      {holes.map(([x, y]) => (
        <circle key={`${x}-${y}`} cx={x} cy={y} r="1.7" fill="var(--color-brass-light)" />
      ))}
    </svg>
  );
}
