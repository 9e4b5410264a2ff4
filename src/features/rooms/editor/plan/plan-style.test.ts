// The plan's style: the theme colours it shares are the app's own (src/styles.css), and its dash
// arrays scale with the plan's one-pixel line.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { dashArray, themeColour } from './plan-style';

const css = readFileSync(join(import.meta.dirname, '../../../../styles.css'), 'utf8');
const kebab = (name: string) => name.replace(/[A-Z]/g, (c) => `-${c.toLowerCase()}`);

describe('the plan style', () => {
  it('takes the theme colours at the values src/styles.css gives them', () => {
    for (const [name, value] of Object.entries(themeColour)) {
      const declared = new RegExp(`--color-${kebab(name)}:\\s*(#[0-9a-fA-F]{6});`).exec(css)?.[1];
      expect(declared?.toLowerCase(), name).toBe(value);
    }
  });

  it('writes a dash pattern in plan mm for the line width', () => {
    expect(dashArray([4, 3], 2)).toBe('8 6');
  });
});
