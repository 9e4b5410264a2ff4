// The renderer's element catalogue is only three-catalogue.ts (vite.config.ts hands it to the
// Canvas): every three.js element a view declares must be in it, or that view fails at run time.
import { describe, expect, it } from 'vitest';
import { readFileSync, readdirSync } from 'node:fs';
import { join, relative, resolve } from 'node:path';
import * as THREE from 'three';
import * as catalogue from './three-catalogue';

const root = resolve(import.meta.dirname, '../..');

function tsxFiles(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((e) =>
    e.isDirectory() ? tsxFiles(join(dir, e.name)) : e.name.endsWith('.tsx') ? [join(dir, e.name)] : [],
  );
}

/** Files drawn inside a Canvas: those that use the renderer's hooks or sit with the scene. */
const sceneFiles = tsxFiles(join(root, 'src')).filter((f) => {
  const text = readFileSync(f, 'utf8');
  return f.includes('/src/scene/') || f.includes('/walkthrough/') || /from '@react-three\/(fiber|drei)'/.test(text);
});

/** Lower-case JSX elements whose class three.js exports (`<mesh>` → Mesh); `<primitive>` needs none. */
function threeElements(text: string): string[] {
  const names = new Set<string>();
  for (const m of text.matchAll(/<([a-z][A-Za-z0-9]*)[\s/>]/g)) {
    const cls = m[1][0].toUpperCase() + m[1].slice(1);
    if (cls in THREE) names.add(cls);
  }
  return [...names];
}

describe('the renderer’s element catalogue', () => {
  it('finds the scene files and their elements', () => {
    expect(sceneFiles.length).toBeGreaterThan(5);
    expect(threeElements('<group><mesh geometry={g} /><lineSegments>')).toEqual(['Group', 'Mesh', 'LineSegments']);
  });

  it('holds every three.js element the views declare, and nothing they do not', () => {
    const used = new Map<string, string[]>();
    for (const f of sceneFiles)
      for (const cls of threeElements(readFileSync(f, 'utf8'))) used.set(cls, [...(used.get(cls) ?? []), relative(root, f)]);
    const missing = [...used.keys()].filter((cls) => !(cls in catalogue));
    expect(missing.map((cls) => `${cls} (${used.get(cls)!.join(', ')})`)).toEqual([]);
    expect(Object.keys(catalogue).sort()).toEqual([...used.keys()].sort());
  });
});
