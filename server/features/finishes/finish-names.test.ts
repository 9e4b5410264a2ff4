// Tests the finish name read from an uploaded photo's file name, control and text-direction
// characters left out.
import { describe, expect, it } from 'vitest';
import { nameFromFileName } from './finishes.service';
import { isCleanName } from '../../../shared/schemas/common';

describe('nameFromFileName', () => {
  it('reads a name from a file name', () => {
    expect(nameFromFileName('oak_boards-02.jpg')).toBe('Oak boards 02');
  });

  it('leaves out control characters and text-direction marks, as every name does', () => {
    // A right-to-left override would show "oak_gpj.exe" as "oak_exe.jpg".
    const name = nameFromFileName('oak\u202egpj.exe\u0007.jpg');
    expect(isCleanName(name)).toBe(true);
    expect(name).toBe('Oakgpj.exe');
  });
});
