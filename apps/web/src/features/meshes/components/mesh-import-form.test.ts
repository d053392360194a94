import { describe, expect, it } from 'vitest';
import { MESH_MAX_BYTES } from '@photon-ledger/shared';
import { checkMeshImport } from './mesh-import-form';

const base = { name: '', units: 'm' as const, rotation: ['0', '0', '0'] as [string, string, string], translation: ['0', '0', '0'] as [string, string, string] };
const fileOf = (name: string, size: number) => new File([new Uint8Array(size)], name);

describe('checkMeshImport', () => {
  it('accepts an OBJ with units, zero rotation and translation', () => {
    expect(checkMeshImport({ ...base, file: fileOf('bus.obj', 100) })).toEqual({});
  });

  it('names the file when it is missing, of another kind, empty or over the limit (before any upload)', () => {
    expect(checkMeshImport({ ...base, file: null }).file).toMatch(/Choose an OBJ or STL/);
    expect(checkMeshImport({ ...base, file: fileOf('bus.step', 10) }).file).toMatch(/not an \.obj or \.stl/);
    expect(checkMeshImport({ ...base, file: fileOf('bus.stl', 0) }).file).toMatch(/empty/);
    // A File's size is what the browser reports; a sparse stand-in keeps the test light.
    const big = Object.defineProperty(fileOf('big.stl', 1), 'size', { value: MESH_MAX_BYTES + 1 });
    expect(checkMeshImport({ ...base, file: big }).file).toMatch(/the limit is 32\.0 MB/);
  });

  it('names the component of a rotation or translation that is not a number, by the schema path', () => {
    const errors = checkMeshImport({ ...base, file: fileOf('a.obj', 5), rotation: ['0', 'ninety', '0'], translation: ['0', '0', ''] });
    expect(Object.keys(errors).sort()).toEqual(['rotationDeg.1', 'translationM.2']);
    expect(errors['rotationDeg.1']).toMatch(/finite numbers \(°\)/);
  });
});
