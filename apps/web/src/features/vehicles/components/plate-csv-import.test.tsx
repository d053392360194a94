import { afterEach, describe, expect, it, vi } from 'vitest';
import { cleanup, fireEvent, render, screen, within } from '@testing-library/react';
import { ApiRequestError } from '../../../lib/api-client';
import { csvProblems, PlateCsvImport } from './plate-csv-import';

afterEach(cleanup);

const refused = new ApiRequestError({
  status: 400,
  code: 'validation_failed',
  message: 'the plate set was refused: row 7, column area_m2: area_m2 must be a number (m²) (and 2 more listed in fields)',
  fields: {
    'row 9': 'name is required',
    'row 7, column area_m2': 'area_m2 must be a number (m²); got "big"',
    file: 'expected a header with name, area_m2, normal_x…',
  },
});

describe('csvProblems', () => {
  it('reads line and column from the keys and lists the whole-file problem first', () => {
    expect(csvProblems(refused.fields)).toEqual([
      { row: null, column: null, field: null, message: 'expected a header with name, area_m2, normal_x…' },
      { row: 7, column: 'area_m2', field: null, message: 'area_m2 must be a number (m²); got "big"' },
      { row: 9, column: null, field: null, message: 'name is required' },
    ]);
  });
});

describe('PlateCsvImport', () => {
  it('lists a refused file’s problems by line and column in an alert', () => {
    render(<PlateCsvImport onFile={() => {}} pending={false} error={refused} explanation="Makes a revision." />);

    const alert = screen.getByRole('alert');
    expect(within(alert).getByText(/nothing was saved/)).toBeTruthy();
    const rows = within(alert).getAllByRole('row').slice(1);
    expect(rows.map((r) => within(r).getAllByRole('cell').map((c) => c.textContent))).toEqual([
      ['file', '—', 'expected a header with name, area_m2, normal_x…'],
      ['7', 'area_m2', 'area_m2 must be a number (m²); got "big"'],
      ['9', 'whole row', 'name is required'],
    ]);
  });

  it('shows the message of a failure without field keys', () => {
    const error = new ApiRequestError({ status: 0, code: 'network_error', message: 'Could not reach the Photon Ledger server.' });
    render(<PlateCsvImport onFile={() => {}} pending={false} error={error} explanation="Makes a revision." />);

    expect(within(screen.getByRole('alert')).getByText('Could not reach the Photon Ledger server.')).toBeTruthy();
    expect(screen.queryByRole('table')).toBeNull();
  });

  it('hands on the chosen file, and is disabled with the reason when importing is not possible now', () => {
    const onFile = vi.fn();
    const { rerender } = render(<PlateCsvImport onFile={onFile} pending={false} error={null} explanation="Makes a revision." />);
    const file = new File(['name,area_m2\n'], 'plates.csv', { type: 'text/csv' });

    fireEvent.change(screen.getByLabelText('Plate CSV file'), { target: { files: [file] } });
    expect(onFile).toHaveBeenCalledWith(file);

    rerender(<PlateCsvImport onFile={onFile} pending={false} error={null} blockedReason="Save first." explanation="Makes a revision." />);
    const button = screen.getByRole('button', { name: 'Import plate CSV', description: 'Save first.' });
    expect((button as HTMLButtonElement).disabled).toBe(true);
  });
});
