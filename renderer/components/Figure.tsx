/** An SVG string from core/drawing, shown scaled to its box. Its text is escaped by the drawing code. */
export function Figure({ svg, label, className }: { svg: string; label: string; className?: string }) {
  return (
    <figure className={`figure ${className ?? ''}`}>
      <div className="figure__svg" role="img" aria-label={label} dangerouslySetInnerHTML={{ __html: svg }} />
      <figcaption className="figure__caption">{label}</figcaption>
    </figure>
  );
}
