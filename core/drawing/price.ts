/** Unit price against order quantity, on a logarithmic quantity axis: the price break curve of a quote. */
import { linearScale, logScale } from './axes';
import type { Chart, ChartSize } from './chart';
import { at, axesMarkup, marker, plotArea, pointLabel } from './chart';
import { group, polyline, svgDocument, text } from './svg';
import { fontSize, lineWeight, mutedInk, seriesColours } from './style';

export interface PricePoint {
  quantity: number;
  unitPrice: number;
}

/** Prices read to the cent, and to a tenth of a cent below one currency unit. */
export function priceText(value: number): string {
  return value.toFixed(Math.abs(value) < 1 ? 3 : 2);
}

/** `points` is never empty: an empty quote gets a placeholder range. */
function chart(points: PricePoint[], size: ChartSize): Chart {
  const width = size.width ?? 480;
  const height = size.height ?? 300;
  const area = plotArea(width, height);
  const quantities = points.map((p) => p.quantity);
  const prices = points.map((p) => p.unitPrice);
  return {
    width, height, area,
    x: logScale(Math.min(...quantities), Math.max(...quantities), [area.left, area.right]),
    y: linearScale(0, Math.max(...prices), [area.bottom, area.top], 6),
  };
}

const placeholder: PricePoint[] = [{ quantity: 1, unitPrice: 1 }, { quantity: 1000, unitPrice: 1 }];
const curveStroke = { stroke: seriesColours.primary, width: lineWeight.thick };

/** Points with a quantity that cannot sit on a log axis (zero, negative, not finite) are left out. */
export function priceCurve(points: PricePoint[], currency: string, size: ChartSize = {}): string {
  const usable = points
    .filter((p) => p.quantity > 0 && Number.isFinite(p.quantity) && Number.isFinite(p.unitPrice))
    .sort((a, b) => a.quantity - b.quantity);
  const c = chart(usable.length > 0 ? usable : placeholder, size);
  const plotted = usable.map((p) => ({ price: p.unitPrice, at: at(c, p.quantity, p.unitPrice) }));
  const empty = text({ x: (c.area.left + c.area.right) / 2, y: (c.area.top + c.area.bottom) / 2 }, 'no prices', {
    size: fontSize.label, anchor: 'middle', fill: mutedInk,
  });
  return svgDocument(c.width, c.height, [
    axesMarkup(c, { x: 'Quantity (pcs)', y: `Unit price (${currency})` }),
    usable.length > 0 ? group([polyline(plotted.map((p) => p.at), curveStroke)], 'price-curve') : empty,
    group(plotted.map((p) => marker(p.at, 'circle', seriesColours.primary) + pointLabel(c, p.at, priceText(p.price))),
      'price-points'),
  ]);
}
