import { describe, expect, it } from 'vitest';
import { CONTROL_STYLE, styleOf, treatmentStyles, trialTreatmentStyles } from './treatment-style';

describe('treatment style', () => {
  it('gives the control neutral grey and the others Okabe–Ito colours in protocol order, each with its own marker', () => {
    const styles = treatmentStyles(['CTL', 'GYP', 'CMP', 'SHL'], 'CTL');
    expect(styles.get('CTL')).toEqual(CONTROL_STYLE);
    expect(CONTROL_STYLE.colour).toBe('#999999');
    // Okabe & Ito (2008): orange #E69F00, sky blue #56B4E9, bluish green #009E73 are the first three.
    expect([styles.get('GYP')?.colour, styles.get('CMP')?.colour, styles.get('SHL')?.colour]).toEqual(['#E69F00', '#56B4E9', '#009E73']);
    const markers = [...styles.values()].map((s) => s.marker);
    expect(new Set(markers).size).toBe(markers.length);
  });

  it('keeps one style per treatment whichever chart asks, whatever order its data came in', () => {
    const protocol = [
      { code: 'CMP', isControl: false, position: 2 },
      { code: 'CTL', isControl: true, position: 0 },
      { code: 'GYP', isControl: false, position: 1 },
    ];
    const fromTrial = trialTreatmentStyles(protocol);
    const fromCodes = treatmentStyles(['CTL', 'GYP', 'CMP'], 'CTL');
    for (const code of ['CTL', 'GYP', 'CMP']) expect(fromTrial.get(code)).toEqual(fromCodes.get(code));
    // A code the protocol does not know still gets a style (not the control's).
    expect(styleOf(fromTrial, 'ZZZ').isControl).toBe(false);
  });

  it('without a control every treatment is coloured', () => {
    expect([...treatmentStyles(['A', 'B']).values()].every((s) => !s.isControl)).toBe(true);
  });
});
