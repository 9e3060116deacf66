/** A progress bar; without `value` it shows that work is going on without saying how far it is. */
export function Progress({ label, value, max = 1, detail }: { label: string; value?: number; max?: number; detail?: string }) {
  return (
    <div className="progress" role="status">
      <div className="progress__label">{label}{detail ? <span className="progress__detail"> — {detail}</span> : null}</div>
      <progress className="progress__bar" aria-label={label} value={value} max={value === undefined ? undefined : max} />
    </div>
  );
}
