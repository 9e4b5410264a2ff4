// Tests for the take-off settings query: written by the client and read back by its schema to the
// same settings, defaults when empty, and refusals with a message.
import { describe, expect, it } from 'vitest';
import { takeoffQuery, takeoffQuerySchema, takeoffSettingsSchema } from './takeoff-settings';
import { defaults } from './test-rooms';

describe('takeoffQuerySchema', () => {
  it('reads the query the client writes', () => {
    const settings = takeoffSettingsSchema.parse({
      coats: 3,
      coverageM2PerL: 12.5,
      wastePercent: 15,
      unitCoverageM2: { boards: 2.2, paper: 5.3 },
    });
    expect(takeoffQuery(settings)).toBe('coats=3&coverage=12.5&waste=15&unitM2=boards%3A2.2&unitM2=paper%3A5.3');
    const written = new URLSearchParams(takeoffQuery(settings));
    const query = Object.fromEntries(
      [...new Set(written.keys())].map((k) => {
        const all = written.getAll(k);
        return [k, all.length > 1 ? all : all[0]];
      }),
    );
    expect(takeoffQuerySchema.parse(query)).toEqual(settings);
    expect(takeoffQuerySchema.parse({})).toEqual(defaults);
    expect(takeoffQuerySchema.parse({ unitM2: 'a:1,b:2.5' }).unitCoverageM2).toEqual({ a: 1, b: 2.5 });
  });

  it('refuses what no paint job has, with a message', () => {
    expect(takeoffQuerySchema.safeParse({ coats: '0' }).error?.issues[0].message).toBe('At least 1 coat.');
    expect(takeoffQuerySchema.safeParse({ coverage: 'lots' }).error?.issues[0].message).toMatch(/Coverage must be a number/);
    expect(takeoffQuerySchema.safeParse({ waste: '500' }).success).toBe(false);
    expect(takeoffQuerySchema.safeParse({ unitM2: 'boards' }).error?.issues[0].message).toMatch(/finishId:m2/);
    expect(takeoffQuerySchema.safeParse({ unitM2: 'boards:0' }).success).toBe(false);
  });
});
