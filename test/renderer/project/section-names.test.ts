import { describe, expect, it } from 'vitest';
import type { SectionShape } from '../../../core/section/shapes.ts';
import { nameAfterDimensionChange, textAfterBarsChange } from '../../../renderer/src/project/section-names.ts';

const inch = (v: number) => v * 25.4;
const tee: SectionShape = { kind: 'tee', height: inch(24), webWidth: inch(12), flangeWidth: inch(54), flangeThickness: inch(5) };

describe('section names that follow their dimensions', () => {
  it('changes the number that stood for the edited dimension', () => {
    const name = 'T 24 × 12 in web, 54 in flange (Level 2 floor)';
    expect(nameAfterDimensionChange(name, tee, 'height', inch(24), inch(30), 'us')).toBe('T 30 × 12 in web, 54 in flange (Level 2 floor)');
    expect(nameAfterDimensionChange(name, tee, 'flangeWidth', inch(54), inch(48), 'us')).toBe('T 24 × 12 in web, 48 in flange (Level 2 floor)');
    expect(nameAfterDimensionChange(name, tee, 'webWidth', inch(12), inch(13.5), 'us')).toBe('T 24 × 13.5 in web, 54 in flange (Level 2 floor)');
  });

  it('leaves a name alone that does not mention the dimension, and remarks in brackets', () => {
    const name = 'T 24 × 12 in web, 54 in flange (Level 2 floor)';
    expect(nameAfterDimensionChange(name, tee, 'flangeThickness', inch(5), inch(6), 'us')).toBe(name);
    const flange2: SectionShape = { ...tee, flangeThickness: inch(2) } as SectionShape;
    expect(nameAfterDimensionChange(name, flange2, 'flangeThickness', inch(2), inch(3), 'us')).toBe(name);
    expect(nameAfterDimensionChange('Main beams', tee, 'height', inch(24), inch(30), 'us')).toBe('Main beams');
  });

  it('never touches bar counts, bar sizes or marks', () => {
    const rect: SectionShape = { kind: 'rectangle', width: inch(14), height: inch(4) };
    expect(nameAfterDimensionChange('Rectangle 14 × 4 in, top 4 #8', rect, 'height', inch(4), inch(5), 'us')).toBe('Rectangle 14 × 5 in, top 4 #8');
    const small: SectionShape = { kind: 'rectangle', width: 300, height: 20 };
    expect(nameAfterDimensionChange('R 300 × 20, B-20, 3 20M', small, 'height', 20, 25, 'si')).toBe('R 300 × 25, B-20, 3 20M');
  });

  it('matches equal dimensions in the order of the fields (b × h)', () => {
    const square: SectionShape = { kind: 'rectangle', width: 600, height: 600 };
    expect(nameAfterDimensionChange('Rectangle 600 × 600', square, 'height', 600, 750, 'si')).toBe('Rectangle 600 × 750');
    expect(nameAfterDimensionChange('Rectangle 600 × 600', square, 'width', 600, 450, 'si')).toBe('Rectangle 450 × 600');
  });

  it('follows typing one keystroke at a time (24 → 3 → 30)', () => {
    const name = 'T 24 × 12 in web, 54 in flange';
    const step1 = nameAfterDimensionChange(name, tee, 'height', inch(24), inch(3), 'us');
    const step2 = nameAfterDimensionChange(step1, { ...tee, height: inch(3) } as SectionShape, 'height', inch(3), inch(30), 'us');
    expect(step2).toBe('T 30 × 12 in web, 54 in flange');
  });

  it('reads the name in the project units (SI names in mm)', () => {
    const rect: SectionShape = { kind: 'rectangle', width: 300, height: 400 };
    expect(nameAfterDimensionChange('Rectangle 300 × 400', rect, 'height', 400, 450, 'si')).toBe('Rectangle 300 × 450');
    // The same section shown in inches: "400" is not 15.748 in, the name stays.
    expect(nameAfterDimensionChange('Rectangle 300 × 400', rect, 'height', 400, 450, 'us')).toBe('Rectangle 300 × 400');
  });
});

describe('labels and names that follow their bars', () => {
  it('names the new bars where the old ones stood alone', () => {
    expect(textAfterBarsChange('bottom 3 #8', '3 #8', '4 #8')).toBe('bottom 4 #8');
    expect(textAfterBarsChange('Rectangle 14 × 24 in, support: top 4 #8, bottom 3 #7', '3 #7', '3 #9')).toBe('Rectangle 14 × 24 in, support: top 4 #8, bottom 3 #9');
    // Written without the space, or in another case, it is still the same bars.
    expect(textAfterBarsChange('top 2Ø12', '2 Ø12', '3 Ø12')).toBe('top 3 Ø12');
  });

  it('leaves text alone that names other bars, names them twice, or only contains the digits', () => {
    expect(textAfterBarsChange('bottom 13 #8', '3 #8', '4 #8')).toBe('bottom 13 #8');
    expect(textAfterBarsChange('bottom 3 #80', '3 #8', '4 #8')).toBe('bottom 3 #80');
    expect(textAfterBarsChange('3 #8 top, 3 #8 bottom', '3 #8', '4 #8')).toBe('3 #8 top, 3 #8 bottom');
    expect(textAfterBarsChange('main bars', '3 #8', '4 #8')).toBe('main bars');
    // A size without a designation has no text to follow.
    expect(textAfterBarsChange('bottom 3 #8', '3 #8', null)).toBe('bottom 3 #8');
  });
});
