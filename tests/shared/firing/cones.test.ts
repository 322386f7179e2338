import * as fc from 'fast-check';

import {
  coneTemperature,
  nearestCone,
  nearestHeatingRate,
  ortonCones,
} from '@/shared/firing/cones';

// Orton Ceramic Foundation, "Temperature Equivalents Chart, °C, cones 022–14" (2016), via
// Orton Ceramic Foundation, "Temperature Equivalents Chart, °C" (2016), as transcribed: cone, °C at 60 °C/h, °C at 150 °C/h.
const published: [string, number, number][] = [
  ['06', 998, 1013],
  ['04', 1063, 1077],
  ['6', 1222, 1243],
  ['8', 1249, 1271],
  ['9', 1260, 1280],
  ['10', 1285, 1305],
  ['11', 1294, 1315],
  ['12', 1306, 1326],
  ['13', 1331, 1348],
];

describe('Orton cones (Orton Ceramic Foundation chart, 2016)', () => {
  it('holds exactly the listed cones', () => {
    expect(ortonCones.map((row) => row.cone)).toEqual(published.map(([cone]) => cone));
  });

  it.each(published)('cone %s: %i °C at 60 °C/h and %i °C at 150 °C/h', (cone, slow, fast) => {
    expect(coneTemperature(cone, 60)).toBe(slow);
    expect(coneTemperature(cone, 150)).toBe(fast);
    expect(nearestCone(slow, 60)).toMatchObject({ cone, differenceC: 0 });
    expect(nearestCone(fast, 150)).toMatchObject({ cone, differenceC: 0 });
  });

  it('a stoneware firing near 1300 °C at 150 °C/h is cone 10 (common practice row)', () => {
    expect(nearestCone(1300, 150)).toEqual({
      cone: '10',
      temperatureC: 1305,
      heatingRate: 150,
      differenceC: -5,
    });
  });

  it('names the cooler cone when two are equally near: 1300 °C at 60 °C/h is cone 11, not 12', () => {
    expect(nearestCone(1300, 60).cone).toBe('11');
  });

  it('uses the nearer chart column for other heating rates, without interpolating', () => {
    expect(nearestHeatingRate(100)).toBe(60);
    expect(nearestHeatingRate(105)).toBe(60);
    expect(nearestHeatingRate(106)).toBe(150);
    expect(coneTemperature('10', 200)).toBe(1305);
    expect(coneTemperature('5', 60)).toBeUndefined();
    expect(() => nearestHeatingRate(0)).toThrow(RangeError);
  });

  it('no listed cone is nearer than the one named', () => {
    fc.assert(
      fc.property(fc.integer({ min: 900, max: 1400 }), fc.constantFrom(60, 150), (t, rate) => {
        const { differenceC, heatingRate } = nearestCone(t, rate);
        for (const row of ortonCones) {
          expect(Math.abs(differenceC)).toBeLessThanOrEqual(
            Math.abs(t - row.temperatureC[heatingRate]),
          );
        }
      }),
      { numRuns: 10000 },
    );
  });
});
