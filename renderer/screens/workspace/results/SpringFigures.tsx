import { memo, useMemo } from 'react';
import type { SpringReport } from '../../../../core/calculate';
import type { Spec } from '../../../../core/spec';
import { goodmanDiagram, specDrawingOptions, springDiagram, springDrawing } from '../../../../core/drawing';
import { Figure } from '../../../components/Figure';
import { captions, kindTerms } from '../../../../core/vocabulary';

interface FigureProps {
  r: SpringReport;
  spec: Spec;
  title: string;
}

const SIZE = { width: 520, height: 300 };

/** The spring drawing, its characteristic and, for cyclic compression duty, the Goodman diagram. `r` in internal units. */
export const SpringFigures = memo(function SpringFigures({ r, spec, title }: FigureProps) {
  const svgs = useMemo(() => ({
    drawing: springDrawing(r, { ...SIZE, title, ...specDrawingOptions(spec) }),
    diagram: springDiagram(r, SIZE),
    goodman: r.kind === 'compression' ? goodmanDiagram(r, SIZE) : null,
  }), [r, spec, title]);
  return (
    <section className="panel" aria-labelledby="drawings-title">
      <h3 id="drawings-title" className="panel__title">Drawing and diagrams</h3>
      <Figure svg={svgs.drawing} label={captions.springDrawing} />
      <Figure svg={svgs.diagram} label={kindTerms[r.kind].document.diagramCaption} />
      {svgs.goodman ? <Figure svg={svgs.goodman} label="Fatigue: alternating against mean stress (Goodman and Gerber)" /> : null}
    </section>
  );
});
