import { describe, expect, it } from 'vitest';
import { statusTransitionRefusal } from './status-transition';

describe('statusTransitionRefusal', () => {
  it('allows draft → active → locked → archived and locked → active', () => {
    expect(statusTransitionRefusal('draft', 'active', false)).toBeNull();
    expect(statusTransitionRefusal('active', 'locked', true)).toBeNull();
    expect(statusTransitionRefusal('locked', 'active', true)).toBeNull();
    expect(statusTransitionRefusal('locked', 'archived', true)).toBeNull();
  });

  it('allows active → draft only without observations (the stubbed answer of ObservationsGuardService)', () => {
    expect(statusTransitionRefusal('active', 'draft', false)).toBeNull();
    expect(statusTransitionRefusal('active', 'draft', true)).toBe('This trial already holds observations, so it cannot go back to draft; lock it instead.');
  });

  it('refuses skipped or backward steps in words', () => {
    expect(statusTransitionRefusal('draft', 'locked', false)).toBe('A draft trial can become active only; it cannot become locked.');
    expect(statusTransitionRefusal('active', 'archived', false)).toBe('An active trial can become draft or locked only; it cannot become archived.');
    expect(statusTransitionRefusal('archived', 'active', false)).toBe('An archived trial cannot change status.');
  });
});
