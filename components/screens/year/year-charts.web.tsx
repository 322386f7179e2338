import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { VictoryAxis } from 'victory-axis';
import { VictoryBar } from 'victory-bar';
import { VictoryChart } from 'victory-chart';
import { VictoryGroup } from 'victory-group';
import { VictoryLine } from 'victory-line';
import { VictoryScatter } from 'victory-scatter';

import { Text } from '@/components/ui/text';
import { fonts, palette, spacing } from '@/constants/theme';

import { type BarsChartProps, type LinesChartProps } from './year-chart-types';

/**
 * Series are told apart by fill or dash and by a point's shape, never by colour alone; the
 * legend shows the same marks.
 */
const barLooks = [
  { fill: palette.accent, stroke: palette.accent },
  { fill: palette.surface, stroke: palette.ink },
  { fill: palette.ochre, stroke: palette.ochre },
] as const;
const lineLooks = [
  { stroke: palette.accent, dash: undefined, symbol: 'circle' },
  { stroke: palette.ochre, dash: '6,4', symbol: 'square' },
  { stroke: palette.ink, dash: '2,3', symbol: 'triangleUp' },
  { stroke: palette.inkMuted, dash: '9,3,2,3', symbol: 'diamond' },
] as const;

const tick = { fontFamily: fonts.body, fontSize: 12, fill: palette.ink, padding: 4 };
const axisStyle = {
  axis: { stroke: palette.outline },
  grid: { stroke: palette.hairline },
  tickLabels: tick,
};

function compactMoney(currency: string) {
  const format = new Intl.NumberFormat('en-GB', {
    style: 'currency',
    currency,
    notation: 'compact',
    maximumFractionDigits: 1,
  });
  return (value: number) => format.format(value);
}

/** The chart's width follows the column it sits in, so its text stays full size on a phone. */
function useWidth() {
  const [width, setWidth] = useState(0);
  return {
    width,
    onLayout: (e: { nativeEvent: { layout: { width: number } } }) =>
      setWidth(Math.round(e.nativeEvent.layout.width)),
  };
}

/** Twelve month names do not fit a phone's width side by side: there, every other one. */
const monthTick = (label: string, index: number, width: number) =>
  width < 560 && index % 2 === 1 ? '' : shorten(label, 5);

const shorten = (text: string, max: number) =>
  text.length > max ? `${text.slice(0, max - 1)}…` : text;

function Swatch({ kind, index }: { kind: 'bar' | 'line'; index: number }) {
  if (kind === 'bar') {
    const look = barLooks[index % barLooks.length]!;
    return (
      <svg width={18} height={14} aria-hidden>
        <rect
          x={1}
          y={1}
          width={16}
          height={12}
          fill={look.fill}
          stroke={look.stroke}
          strokeWidth={2}
        />
      </svg>
    );
  }
  const look = lineLooks[index % lineLooks.length]!;
  return (
    <svg width={34} height={14} aria-hidden>
      <line
        x1={1}
        y1={7}
        x2={33}
        y2={7}
        stroke={look.stroke}
        strokeWidth={2.5}
        strokeDasharray={look.dash}
      />
      {look.symbol === 'circle' ? <circle cx={17} cy={7} r={4} fill={look.stroke} /> : null}
      {look.symbol === 'square' ? (
        <rect x={13} y={3} width={8} height={8} fill={look.stroke} />
      ) : null}
      {look.symbol === 'triangleUp' ? <path d="M17 2 L22 11 L12 11 Z" fill={look.stroke} /> : null}
      {look.symbol === 'diamond' ? (
        <path d="M17 2 L22 7 L17 12 L12 7 Z" fill={look.stroke} />
      ) : null}
    </svg>
  );
}

function Legend({ names, kind }: { names: readonly string[]; kind: 'bar' | 'line' }) {
  if (names.length < 2) return null;
  return (
    <View style={styles.legend} aria-hidden>
      {names.map((name, index) => (
        <View key={name} style={styles.legendItem}>
          <Swatch kind={kind} index={index} />
          <Text variant="small" style={styles.legendText}>
            {name}
          </Text>
        </View>
      ))}
    </View>
  );
}

/** Bars, one group a category; horizontal for long names (venues, series). */
export function BarsChart({
  label,
  categories,
  series,
  currency,
  horizontal,
  testID,
}: BarsChartProps) {
  const { width, onLayout } = useWidth();
  const money = compactMoney(currency);
  const rows = categories.length;
  const height = horizontal ? Math.max(140, 56 + rows * series.length * 22 + rows * 12) : 240;
  const left = horizontal ? Math.min(150, Math.max(90, width * 0.34)) : 58;
  // Horizontal groups are drawn from the bottom up: reversed, the first series reads first.
  const ordered = series.map((s, index) => ({ s, index }));
  if (horizontal) ordered.reverse();
  const bars = ordered.map(({ s, index }) => {
    const look = barLooks[index % barLooks.length]!;
    return (
      <VictoryBar
        key={s.name}
        data={categories.map((c, i) => ({ x: c, y: s.values[i] ?? 0 }))}
        barWidth={
          horizontal ? 16 : Math.max(6, Math.min(18, (width - 80) / (rows * (series.length + 1))))
        }
        style={{ data: { fill: look.fill, stroke: look.stroke, strokeWidth: 1.5 } }}
      />
    );
  });
  return (
    <View testID={testID} style={styles.chart} onLayout={onLayout}>
      {width > 0 ? (
        <VictoryChart
          title={label}
          width={width}
          height={height}
          horizontal={horizontal}
          // A group's bars spread either side of its category: room for the outer ones.
          domainPadding={{ x: horizontal ? (series.length * 18) / 2 + 14 : 14, y: [0, 12] }}
          padding={{ top: 12, bottom: 36, left, right: 18 }}
        >
          <VictoryAxis
            style={axisStyle}
            tickFormat={(t: string, i: number) =>
              horizontal ? shorten(String(t), 18) : monthTick(String(t), i, width)
            }
          />
          <VictoryAxis
            dependentAxis
            style={axisStyle}
            tickFormat={money}
            tickCount={horizontal ? 3 : 4}
          />
          {series.length > 1 ? (
            <VictoryGroup offset={horizontal ? 18 : 12}>{bars}</VictoryGroup>
          ) : (
            bars
          )}
        </VictoryChart>
      ) : null}
      <Legend names={series.map((s) => s.name)} kind="bar" />
    </View>
  );
}

/** Lines over the months, with an optional level drawn across (a threshold). */
export function LinesChart({
  label,
  categories,
  series,
  currency,
  level,
  testID,
}: LinesChartProps) {
  const { width, onLayout } = useWidth();
  const money = compactMoney(currency);
  const names = [...series.map((s) => s.name), ...(level ? [level.name] : [])];
  return (
    <View testID={testID} style={styles.chart} onLayout={onLayout}>
      {width > 0 ? (
        <VictoryChart
          title={label}
          width={width}
          height={250}
          domainPadding={{ x: 10, y: [0, 12] }}
          padding={{ top: 12, bottom: 36, left: 58, right: 18 }}
        >
          <VictoryAxis
            style={axisStyle}
            tickFormat={(t: string, i: number) => monthTick(String(t), i, width)}
          />
          <VictoryAxis dependentAxis style={axisStyle} tickFormat={money} tickCount={4} />
          {series.flatMap((s, index) => {
            const look = lineLooks[index % lineLooks.length]!;
            const data = categories.map((c, i) => ({ x: c, y: s.values[i] ?? 0 }));
            return [
              <VictoryLine
                key={`${s.name}-line`}
                data={data}
                style={{
                  data: { stroke: look.stroke, strokeWidth: 2.5, strokeDasharray: look.dash },
                }}
              />,
              <VictoryScatter
                key={`${s.name}-points`}
                data={data}
                size={3.5}
                symbol={look.symbol}
                style={{ data: { fill: look.stroke } }}
              />,
            ];
          })}
          {level ? (
            <VictoryLine
              data={categories.map((c) => ({ x: c, y: level.value }))}
              style={{ data: { stroke: palette.danger, strokeWidth: 2, strokeDasharray: '12,5' } }}
            />
          ) : null}
        </VictoryChart>
      ) : null}
      {level ? (
        <View style={styles.legend} aria-hidden>
          <Legend names={series.map((s) => s.name)} kind="line" />
          <View style={styles.legendItem}>
            <svg width={34} height={14} aria-hidden>
              <line
                x1={1}
                y1={7}
                x2={33}
                y2={7}
                stroke={palette.danger}
                strokeWidth={2}
                strokeDasharray="12,5"
              />
            </svg>
            <Text variant="small" style={styles.legendText}>
              {level.name}
            </Text>
          </View>
        </View>
      ) : (
        <Legend names={names} kind="line" />
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  chart: { width: '100%', gap: spacing.xs },
  legend: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
  legendItem: { flexDirection: 'row', alignItems: 'center', gap: spacing.xs },
  legendText: { color: palette.ink },
});
