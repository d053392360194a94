import { budgetLineKeys as sharedKeys, budgetLineUnits as sharedUnits } from '@photon-ledger/shared';
import { describe, expect, it } from 'vitest';
import { SrpError } from '../errors';
import { applyRequirement, applyRequirements, budgetLine, budgetLineDefinitions, budgetLineKeys, marginPercent } from './budget-line';

describe('margins against requirements', () => {
  it("a '<=' requirement of 10 with a value of 8 leaves 20 % margin", () => {
    expect(marginPercent(8, '<=', 10)).toBe(20);
  });

  it("a '>=' requirement of 10 with a value of 8 is 20 % short", () => {
    expect(marginPercent(8, '>=', 10)).toBe(-20);
  });

  it("a negative floor (drift >= -5 m/day) with -4 m/day keeps a positive 20 % margin", () => {
    expect(marginPercent(-4, '>=', -5)).toBe(20);
  });

  it('passes exactly at the minimum margin and fails just below it, both comparators', () => {
    // 10 % policy: '<=' 10 passes at 9 (margin exactly 10 %), fails at 9.01.
    const ceiling = { line: 'srp.deltaV.total', comparator: '<=', value: 10, minMarginPercent: 10 } as const;
    expect(applyRequirement(budgetLine('srp.deltaV.total', 9), ceiling)).toMatchObject({ pass: true, status: 'pass' });
    expect(applyRequirement(budgetLine('srp.deltaV.total', 9.01), ceiling)).toMatchObject({ pass: false, status: 'fail' });
    // '>=' 3 with 10 %: 3.3 is at the boundary ((3.3 − 3)/3·100 rounds to 9.999999999999995 in binary).
    const floor = { line: 'momentum.timeBetweenDumps', comparator: '>=', value: 3, minMarginPercent: 10 } as const;
    expect(applyRequirement(budgetLine('momentum.timeBetweenDumps', 3.3), floor)).toMatchObject({ pass: true, status: 'pass' });
    expect(applyRequirement(budgetLine('momentum.timeBetweenDumps', 3.29), floor)).toMatchObject({ pass: false, status: 'fail' });
  });

  it('reports a line without a requirement as no-requirement, without margin', () => {
    const [line] = applyRequirements([budgetLine('torque.max', 1e-5)]);
    expect(line).toEqual({ key: 'torque.max', label: 'SRP torque, maximum |tau|', value: 1e-5, unit: 'N*m', status: 'no-requirement' });
  });

  it('fails a requirement on a line without a value (target not reached), status no-value', () => {
    const line = applyRequirement(budgetLine('sail.timeToTarget', null, 'not reached'), {
      line: 'sail.timeToTarget',
      comparator: '<=',
      value: 1e8,
    });
    expect(line).toMatchObject({ pass: false, status: 'no-value', requirement: { minMarginPercent: 0 } });
    expect(line.marginPercent).toBeUndefined();
  });

  it('refuses a requirement of 0 and a repeated line, naming the field', () => {
    expect(() => marginPercent(1, '<=', 0)).toThrow(SrpError);
    const r = { line: 'drift.a', comparator: '<=', value: 5 } as const;
    try {
      applyRequirements([budgetLine('drift.a', 1)], [r, r]);
      expect.unreachable();
    } catch (e) {
      expect((e as SrpError).details.field).toBe('requirements.1.line');
    }
  });
});

describe('budget line keys', () => {
  it('are the same closed set, in the same order and units, as the shared schema', () => {
    expect([...budgetLineKeys]).toEqual([...sharedKeys]);
    for (const key of budgetLineKeys) expect(budgetLineDefinitions[key].unit).toBe(sharedUnits[key]);
  });
});
