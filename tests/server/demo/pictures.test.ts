import { demoWorks } from '@/server/demo/demo-studio';
import { formFor } from '@/server/demo/pictures/forms';
import { clayColour, glazeColours } from '@/server/demo/pictures/glazes';
import { secondViewFor, vesselSvg } from '@/server/demo/pictures/vessel-picture';

const unknownGlaze = glazeColours('Something the studio made up');

describe('the demo pictures', () => {
  it('knows the colours of every glaze the demo uses, and falls back for others', () => {
    for (const { glaze } of demoWorks) expect(glazeColours(glaze)).not.toBe(unknownGlaze);
    expect(glazeColours('Mystery matt')).toBe(unknownGlaze);
    // Tenmoku is the dark iron glaze, celadon the pale green one: compare their lightness.
    const lightness = (hex: string) =>
      [1, 3, 5].reduce((sum, i) => sum + parseInt(hex.slice(i, i + 2), 16), 0) / 3;
    expect(lightness(glazeColours('Tenmoku').base)).toBeLessThan(60);
    expect(lightness(glazeColours('Celadon').base)).toBeGreaterThan(150);
    expect(clayColour('Porcelain')).not.toBe(clayColour('Black stoneware'));
  });

  it('gives each category a shape of its own', () => {
    const shape = (category: string, title = '') => {
      const form = formFor({ category, title });
      return form.kind === 'thrown' ? form : { ...form, mouth: null, handle: false };
    };
    expect(shape('Jar').mouth).toBe('narrow');
    expect(shape('Bottle').mouth).toBe('narrow');
    expect(shape('Bowl').mouth).toBe('open');
    expect(shape('Mug').handle).toBe(true);
    expect(shape('Jug')).toMatchObject({ handle: true, spout: true });
    expect(shape('Box').mouth).toBe('lidded');
    expect(shape('Wall piece').kind).toBe('wall-piece');
    expect(shape('Sculpture').kind).toBe('standing');
    expect(shape('Jar', 'Moon jar, celadon')).not.toEqual(shape('Jar'));
    expect(shape('Platter')).toEqual(shape('Plate'));
  });

  it('looks into wide open pots from above and close at the glaze of the rest', () => {
    const byTitle = (title: string) => demoWorks.find((w) => w.title === title)!;
    expect(secondViewFor(byTitle('Wide bowl, chun'))).toBe('above');
    expect(secondViewFor(byTitle('Charger, ash run'))).toBe('above');
    expect(secondViewFor(byTitle('Everyday mug, oatmeal'))).toBe('detail');
    expect(secondViewFor(byTitle('Tall bottle, chun blue'))).toBe('detail');
  });

  it('draws the same picture for the same work, and a different one for another view', () => {
    const work = demoWorks[0]!;
    expect(vesselSvg(work, 'front')).toBe(vesselSvg({ ...work }, 'front'));
    expect(vesselSvg(work, 'detail')).not.toBe(vesselSvg(work, 'front'));
  });
});
