import { afterEach, describe, expect, it } from 'vitest';
import { cleanup, render, screen, within } from '@testing-library/react';
import type { RunBudgetReport } from '@photon-ledger/shared';
import { BudgetTable } from './budget-table';

afterEach(cleanup);

const budget = {
  runId: '00000000-0000-4000-8000-000000000001',
  caution: 'caution',
  epochUtc: '2026-09-08T00:00:00.000Z',
  spanSeconds: 86_400,
  sampleCount: 289,
  requirementsAsOf: '2026-12-02T04:01:56.487Z',
  lines: [
    {
      key: 'srp.accel.max',
      label: 'SRP acceleration, maximum |a|',
      value: 1.0908961859927037e-7,
      unit: 'm/s^2',
      requirement: { comparator: '<=', value: 2e-7, minMarginPercent: 10 },
      marginPercent: 45.455,
      pass: true,
      status: 'pass',
    },
    {
      key: 'srp.deltaV.total',
      label: 'Delta-v from SRP, integral of |a|',
      value: 0.54,
      unit: 'm/s',
      requirement: { comparator: '<=', value: 0.5, minMarginPercent: 20 },
      marginPercent: -8,
      pass: false,
      status: 'fail',
    },
    { key: 'torque.max', label: 'SRP torque, maximum |tau|', value: 1.143e-4, unit: 'N*m', status: 'no-requirement' },
    {
      key: 'momentum.timeBetweenDumps',
      label: 'Mean time between momentum dumps',
      value: null,
      unit: 's',
      note: 'no dump within the span (dump when |H| reaches 16 N*m*s)',
      requirement: { comparator: '>=', value: 86_400, minMarginPercent: 0 },
      status: 'no-value',
    },
  ],
  counts: { pass: 1, fail: 1, noRequirement: 1, noValue: 1 },
} as unknown as RunBudgetReport;

function rowOf(label: string): HTMLElement {
  const row = screen.getByRole('rowheader', { name: new RegExp(label.replace(/[|()]/g, '\\$&')) }).closest('tr');
  if (!row) throw new Error(`no row for ${label}`);
  return row;
}

describe('BudgetTable', () => {
  it('counts the lines by status at the top', () => {
    render(<BudgetTable budget={budget} />);
    const counts = within(screen.getByRole('list', { name: 'Budget lines by status' }));
    expect(counts.getByText('pass', { exact: false }).textContent).toBe('1 pass');
    expect(counts.getByText('fail', { exact: false }).textContent).toBe('1 fail');
    expect(counts.getByText('no requirement', { exact: false }).textContent).toBe('1 no requirement');
    expect(counts.getByText('no value', { exact: false }).textContent).toBe('1 no value');
  });

  it('shows a passing line with its value, requirement, margin and a Pass badge in words', () => {
    render(<BudgetTable budget={budget} />);
    const row = within(rowOf('SRP acceleration, maximum |a|'));
    expect(row.getByText('1.091 × 10⁻⁷ m/s²')).toBeTruthy();
    expect(row.getByText('≤ 2.000 × 10⁻⁷ m/s²')).toBeTruthy();
    expect(row.getByText('margin ≥ 10.0 %')).toBeTruthy();
    expect(row.getByText('+45.5 %')).toBeTruthy();
    expect(row.getByText('Pass')).toBeTruthy();
  });

  it('marks a failing line with a Fail badge and its negative margin', () => {
    render(<BudgetTable budget={budget} />);
    const row = within(rowOf('Delta-v from SRP'));
    expect(row.getByText('0.5400 m/s')).toBeTruthy();
    expect(row.getByText('−8.0 %')).toBeTruthy();
    expect(row.getByText('Fail')).toBeTruthy();
  });

  it('says No requirement and No value in words, with the reason for a missing value', () => {
    render(<BudgetTable budget={budget} />);
    expect(within(rowOf('SRP torque, maximum')).getByText('No requirement')).toBeTruthy();
    expect(within(rowOf('SRP torque, maximum')).getByText('1.143 × 10⁻⁴ N·m')).toBeTruthy();
    const missing = within(rowOf('Mean time between momentum dumps'));
    expect(missing.getByText('No value')).toBeTruthy();
    expect(missing.getByText('no value')).toBeTruthy();
    expect(missing.getByText('no dump within the span (dump when |H| reaches 16 N·m·s)')).toBeTruthy();
    expect(missing.getByText('≥ 86 400 s', { exact: false })).toBeTruthy();
  });
});
