import { describe, expect, it } from 'vitest';
import { barArea } from '../../../core/section/definition.ts';
import { astmBarDiameter, barDesignation, csaBarDiameter, parseBarDesignation } from '../../../core/section/bar-designations.ts';

const ok = (text: string) => {
  const parsed = parseBarDesignation(text);
  if (!parsed || !parsed.ok) throw new Error(`${text} was not read: ${JSON.stringify(parsed)}`);
  return parsed;
};

describe('bar designations', () => {
  it('reads ASTM bar numbers with the nominal diameters of ASTM A615 Table 1', () => {
    // ASTM A615/A615M Table 1: #4 0.500 in, #8 1.000 in, #9 1.128 in, #11 1.410 in, #18 2.257 in
    expect(ok('#4').diameter).toBeCloseTo(0.5 * 25.4, 9);
    expect(ok('#8').diameter).toBeCloseTo(25.4, 9);
    expect(ok('No. 9').diameter).toBeCloseTo(1.128 * 25.4, 9);
    expect(ok('#11').diameter).toBeCloseTo(1.41 * 25.4, 9);
    expect(ok('#18').diameter).toBeCloseTo(2.257 * 25.4, 9);
    expect(ok('#8').text).toBe('#8');
  });

  it('gives the bar areas ASTM A615 tabulates, to the rounding of the table', () => {
    // ASTM A615/A615M Table 1 nominal areas, in², given to 0.01 in²
    const tabulated: [number, number][] = [[3, 0.11], [4, 0.2], [5, 0.31], [6, 0.44], [7, 0.6], [8, 0.79], [9, 1.0], [10, 1.27], [11, 1.56], [14, 2.25], [18, 4.0]];
    for (const [size, area] of tabulated) {
      const squareInches = barArea(astmBarDiameter(size)!) / 25.4 ** 2;
      expect(Math.abs(squareInches - area), `#${size}`).toBeLessThanOrEqual(0.005);
    }
  });

  it('reads CSA sizes with the nominal diameters and areas of CSA G30.18 Table 1', () => {
    // CSA G30.18 Table 1: 10M 11.3 mm 100 mm², 20M 19.5 mm 300 mm², 35M 35.7 mm 1000 mm², 55M 56.4 mm 2500 mm²
    // (areas rounded to 100 mm² in the table, hence the 1 % below)
    expect(ok('10M').diameter).toBe(11.3);
    expect(ok('20M').diameter).toBe(19.5);
    expect(ok('35 M').diameter).toBe(35.7);
    const tabulated: [number, number][] = [[10, 100], [15, 200], [20, 300], [25, 500], [30, 700], [35, 1000], [45, 1500], [55, 2500]];
    for (const [size, area] of tabulated) expect(Math.abs(barArea(csaBarDiameter(size)!) / area - 1), `${size}M`).toBeLessThan(0.01);
  });

  it('reads metric diameters after Ø and the T, H, Y letters of UK bar schedules', () => {
    expect(ok('Ø20')).toMatchObject({ diameter: 20, text: 'Ø20', system: 'metric' });
    expect(ok('ø 16').diameter).toBe(16);
    expect(ok('T25').diameter).toBe(25);
    expect(ok('H12').diameter).toBe(12);
    // EN 10080 8.1: nominal diameters in half millimetres up to 10 mm
    expect(ok('Ø5.5').diameter).toBe(5.5);
    expect(ok('Ø7,5').diameter).toBe(7.5);
  });

  it('reads a count written in front of the size', () => {
    expect(ok('3 #8')).toMatchObject({ count: 3, text: '#8' });
    expect(ok('3#8')).toMatchObject({ count: 3, text: '#8' });
    expect(ok('4Ø20')).toMatchObject({ count: 4, diameter: 20 });
    expect(ok('2T16')).toMatchObject({ count: 2, diameter: 16 });
    expect(ok('3-20M')).toMatchObject({ count: 3, diameter: 19.5 });
    expect(ok('3 20M')).toMatchObject({ count: 3, diameter: 19.5 });
    expect(ok('20M').count).toBeUndefined();
  });

  it('refuses sizes the standards do not have, naming those that exist', () => {
    const astm = parseBarDesignation('#12');
    expect(astm).toMatchObject({ ok: false });
    expect(astm && !astm.ok && astm.message).toContain('#11, #14, #18');
    const csa = parseBarDesignation('40M');
    expect(csa && !csa.ok && csa.message).toContain('45M');
    const metric = parseBarDesignation('Ø10.3');
    expect(metric && !metric.ok && metric.message).toContain('half millimetres');
    expect(parseBarDesignation('Ø60')).toMatchObject({ ok: false });
  });

  it('leaves plain numbers and lengths to the number field', () => {
    for (const text of ['25', '25 mm', '1 in', '0.75', '20 m', 'abc', '']) expect(parseBarDesignation(text), text).toBeNull();
  });

  it('names a diameter the way each unit system writes it', () => {
    expect(barDesignation(25.4, 'US')).toBe('#8');
    expect(barDesignation(28.6512, 'us')).toBe('#9');
    expect(barDesignation(20, 'SI')).toBe('Ø20');
    expect(barDesignation(16, 'SI')).toBe('Ø16');
    expect(barDesignation(19.5, 'SI')).toBe('20M');
    expect(barDesignation(25.4, 'SI')).toBe('#8');
    expect(barDesignation(20, 'US')).toBe('Ø20');
    expect(barDesignation(19.5, 'US')).toBe('20M');
    expect(barDesignation(23.7, 'SI')).toBeNull();
    expect(barDesignation(undefined, 'SI')).toBeNull();
    expect(barDesignation(Number.NaN, 'US')).toBeNull();
  });

  it('reads back every designation it writes', () => {
    for (const d of [9.525, 12.7, 15.875, 25.4, 35.814, 57.3278, 11.3, 56.4, 6, 8, 10, 12, 25, 32, 40, 50]) {
      for (const system of ['SI', 'US'] as const) {
        const text = barDesignation(d, system);
        if (text === null) continue;
        expect(ok(text).diameter, `${text} (${system})`).toBeCloseTo(d, 6);
      }
    }
  });
});
