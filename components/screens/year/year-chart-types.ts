/** One series of a chart: its name (for the legend) and a value for each category, in major units. */
export type ChartSeries = { name: string; values: readonly number[] };

export type BarsChartProps = {
  /** What the chart shows, for screen readers; the table below it holds the figures. */
  label: string;
  categories: readonly string[];
  series: readonly ChartSeries[];
  currency: string;
  horizontal?: boolean;
  testID: string;
};

export type LinesChartProps = {
  label: string;
  categories: readonly string[];
  series: readonly ChartSeries[];
  currency: string;
  /** A level drawn across the chart, such as a threshold. */
  level?: { name: string; value: number };
  testID: string;
};
