import { describe, expect, it } from 'vitest';
import { safeNextPath, signInPath } from './sign-in-redirect';

describe('sign-in redirect', () => {
  it('remembers the page with its search and returns to it', () => {
    const path = signInPath({ pathname: '/missions', search: '?regime=heliocentric', hash: '' });
    const next = new URLSearchParams(path.split('?')[1]).get('next');

    expect(safeNextPath(next)).toBe('/missions?regime=heliocentric');
  });

  it('never sends the user to another site or back to sign-in', () => {
    for (const next of ['https://example.org/', '//example.org/x', '/\\example.org', 'missions', '/sign-in', null]) {
      expect(safeNextPath(next)).toBe('/missions');
    }
  });
});
