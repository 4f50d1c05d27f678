import { describe, expect, it } from 'vitest';
import { activityKindLabel, kindMatches } from './activity-kinds';

describe('activity kinds', () => {
  it('names known kinds and falls back to the group and verb', () => {
    expect(activityKindLabel('site.randomized')).toBe('Site randomized');
    expect(activityKindLabel('invitation.revoked')).toBe('Invitation withdrawn');
    expect(activityKindLabel('analysis.signed-off')).toBe('Analysis signed off');
    expect(activityKindLabel('member.removed')).toBe('Member removed');
    expect(activityKindLabel('analysis.archived')).toBe('Analyses and review: archived');
    expect(activityKindLabel('compost.spread')).toBe('compost: spread');
  });

  it('matches a whole group by the part before the dot, or one exact kind', () => {
    expect(kindMatches('site.randomized', '')).toBe(true);
    expect(kindMatches('site.randomized', 'site')).toBe(true);
    expect(kindMatches('site.randomized', 'site.created')).toBe(false);
    expect(kindMatches('sites.randomized', 'site')).toBe(false);
  });
});
