import type { OutputDocument } from './output-document.js';
import { svgChart } from './svg-chart.js';

/**
 * A document's charts as one SVG file: each chart (svgChart) stacked below the one before, as
 * nested `<svg>` elements, so a report with a warming chart and a difference chart is one picture.
 *
 * @param doc the document
 * @returns the SVG document text
 */
export function svgText(doc: OutputDocument): string {
  const charts = doc.charts.map(svgChart);
  if (charts.length === 1) return charts[0];
  const sizes = doc.charts.map((c) => ({ width: c.width ?? 720, height: c.height ?? 420 }));
  const width = Math.max(...sizes.map((s) => s.width));
  const height = sizes.reduce((sum, s) => sum + s.height, 0);
  let y = 0;
  const parts = charts.map((svg, i) => {
    const placed = svg.replace(/^<svg /, `<svg x="0" y="${y}" `);
    y += sizes[i].height;
    return placed;
  });
  return `<svg xmlns="http://www.w3.org/2000/svg" width="${width}" height="${height}" viewBox="0 0 ${width} ${height}">\n${parts.join('')}</svg>\n`;
}
