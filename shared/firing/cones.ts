/** The heating rates, over the last 100 °C, that the published chart has a column for. */
export const coneHeatingRates = [60, 150] as const;
export type ConeHeatingRate = (typeof coneHeatingRates)[number];

export interface ConeRow {
  cone: string;
  /** Self-supporting cone, °C, by heating rate (°C per hour). */
  temperatureC: Readonly<Record<ConeHeatingRate, number>>;
}

/**
 * Orton Ceramic Foundation, "Temperature Equivalents Chart, °C, cones 022–14" (2016),
 * self-supporting cones; only the cones both transcriptions agree on, coolest first.
 */
export const ortonCones: readonly ConeRow[] = [
  { cone: '06', temperatureC: { 60: 998, 150: 1013 } },
  { cone: '04', temperatureC: { 60: 1063, 150: 1077 } },
  { cone: '6', temperatureC: { 60: 1222, 150: 1243 } },
  { cone: '8', temperatureC: { 60: 1249, 150: 1271 } },
  { cone: '9', temperatureC: { 60: 1260, 150: 1280 } },
  { cone: '10', temperatureC: { 60: 1285, 150: 1305 } },
  { cone: '11', temperatureC: { 60: 1294, 150: 1315 } },
  { cone: '12', temperatureC: { 60: 1306, 150: 1326 } },
  { cone: '13', temperatureC: { 60: 1331, 150: 1348 } },
];

/**
 * The chart column for a heating rate: the nearer of 60 and 150 °C/h (a tie takes 60). The chart
 * gives no values between its columns, so none are interpolated.
 */
export function nearestHeatingRate(ratePerHour: number): ConeHeatingRate {
  if (!Number.isFinite(ratePerHour) || ratePerHour <= 0) {
    throw new RangeError('Enter the heating rate in °C per hour, above zero.');
  }
  return Math.abs(ratePerHour - 60) <= Math.abs(ratePerHour - 150) ? 60 : 150;
}

/** The temperature for a cone at a heating rate (Orton chart); undefined for an unlisted cone. */
export function coneTemperature(cone: string, ratePerHour: number): number | undefined {
  const rate = nearestHeatingRate(ratePerHour);
  return ortonCones.find((row) => row.cone === cone)?.temperatureC[rate];
}

export interface NearestCone {
  cone: string;
  /** The chart's temperature for that cone in the column used. */
  temperatureC: number;
  heatingRate: ConeHeatingRate;
  /** Firing temperature minus the cone's: positive when the firing was hotter. */
  differenceC: number;
}

/**
 * The listed Orton cone nearest a firing temperature at a heating rate (chart above). Between two
 * equally near cones the cooler one is named, so a firing is never credited with more heat.
 */
export function nearestCone(temperatureC: number, ratePerHour: number): NearestCone {
  if (!Number.isFinite(temperatureC)) throw new RangeError('Enter the firing temperature in °C.');
  const heatingRate = nearestHeatingRate(ratePerHour);
  let best = ortonCones[0]!;
  for (const row of ortonCones) {
    const distance = Math.abs(temperatureC - row.temperatureC[heatingRate]);
    if (distance < Math.abs(temperatureC - best.temperatureC[heatingRate])) best = row;
  }
  const coneTemperatureC = best.temperatureC[heatingRate];
  return {
    cone: best.cone,
    temperatureC: coneTemperatureC,
    heatingRate,
    differenceC: temperatureC - coneTemperatureC,
  };
}
