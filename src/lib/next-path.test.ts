// Tests for the sign-in redirect: only a same-site path is kept, anything else goes to the projects list.
import { describe, expect, it } from 'vitest';
import { safeNextPath } from './next-path';

describe('safeNextPath', () => {
  it('keeps a same-site path with its query', () => {
    expect(safeNextPath('/projects/abc?tab=rooms')).toBe('/projects/abc?tab=rooms');
    expect(safeNextPath('/')).toBe('/');
  });
  it('sends anything else to the projects list', () => {
    for (const bad of [
      null,
      '',
      'projects',
      'https://elsewhere.example/x',
      '//elsewhere.example',
      '/\\elsewhere.example',
      'javascript:alert(1)',
      '/a\nb',
      '/sign-in?next=/x',
    ]) {
      expect(safeNextPath(bad)).toBe('/projects');
    }
  });
});
