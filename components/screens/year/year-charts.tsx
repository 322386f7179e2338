import { type BarsChartProps, type LinesChartProps } from './year-chart-types';

// The charts are drawn on the web (SVG); elsewhere the table under each carries the same figures.
export function BarsChart(_props: BarsChartProps) {
  return null;
}

export function LinesChart(_props: LinesChartProps) {
  return null;
}
