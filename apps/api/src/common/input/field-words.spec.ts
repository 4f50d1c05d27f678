import { describe, expect, it } from 'vitest';
import { fieldWords, inPeoplesWords } from './field-words';

describe('field words', () => {
  it('names fields as the screens do', () => {
    expect(fieldWords('plausibleMin')).toBe('plausible minimum');
    expect(fieldWords('siteId')).toBe('site');
    expect(fieldWords('measureIds')).toBe('measures');
    expect(fieldWords('startDate')).toBe('start date');
    expect(fieldWords('lengthM')).toBe('length (m)');
    expect(fieldWords('areaM2')).toBe('area (m²)');
    expect(fieldWords('incorporationDepthCm')).toBe('incorporation depth (cm)');
    expect(fieldWords('soilVolumeL')).toBe('soil volume (L)');
    expect(fieldWords('marginPercent')).toBe('margin (%)');
    expect(fieldWords('bulkDensityKgPerL')).toBe('bulk density (kg/L)');
    expect(fieldWords('title')).toBe('title');
  });

  it('rewrites every code-style name in a message, and counts list items from one', () => {
    expect(inPeoplesWords('scaleMin must be below scaleMax')).toBe('lowest score must be below highest score');
    expect(inPeoplesWords('observations.0.plotLabel must be text')).toBe('plot label of item 1 of observations must be text');
    expect(inPeoplesWords('Row 3 of your file: drain time is not a number.')).toBe('Row 3 of your file: drain time is not a number.');
    // Unit symbols are people's words already.
    expect(inPeoplesWords('450 mL is above 400 mL; 3 kPa; 2 dS/m')).toBe('450 mL is above 400 mL; 3 kPa; 2 dS/m');
  });
});
