import { useId, useRef } from 'react';
import { Button } from '../../../components/ui/button';
import { ApiRequestError } from '../../../lib/api-client';

/** One problem of a refused CSV, from its key in the API's `fields` (`row 5, column area_m2`, `row 5`, `file`). */
export interface CsvProblem {
  /** File line, or null for the whole file or a form field. */
  row: number | null;
  /** Column name, or null for the whole row. */
  column: string | null;
  /** Other keys (a form field such as `massKg`). */
  field: string | null;
  message: string;
}

const ROW_KEY = /^row (\d+)(?:, column (.+))?$/;

/** The problems of a refused upload, in file order; form-field problems (`massKg`) last. */
export function csvProblems(fields: Readonly<Record<string, string>> | undefined): CsvProblem[] {
  if (!fields) return [];
  const problems = Object.entries(fields).map(([key, message]): CsvProblem => {
    const match = ROW_KEY.exec(key);
    if (match) return { row: Number(match[1]), column: match[2] ?? null, field: null, message };
    if (key === 'file') return { row: null, column: null, field: null, message };
    return { row: null, column: null, field: key, message };
  });
  const rank = (p: CsvProblem) => (p.field !== null ? 2 : p.row === null ? 0 : 1);
  return problems.sort((a, b) => rank(a) - rank(b) || (a.row ?? 0) - (b.row ?? 0));
}

/** Props of PlateCsvImport. */
export interface PlateCsvImportProps {
  /** Called with the chosen file. */
  onFile: (file: File) => void;
  pending: boolean;
  /** Why the import cannot start now (shown beside the button, which is then disabled). */
  blockedReason?: string | null;
  /** The failed upload, if the last one failed. */
  error: unknown;
  /** What the last successful import did. */
  notice?: string | null;
  /** What importing will do, in one sentence. */
  explanation: string;
}

/**
 * "Import plate CSV": picks a file and hands it on; a refused file's problems are listed by line
 * and column so they can be found in the file.
 */
export function PlateCsvImport({ onFile, pending, blockedReason, error, notice, explanation }: PlateCsvImportProps) {
  const inputRef = useRef<HTMLInputElement>(null);
  const id = useId();
  const problems = error instanceof ApiRequestError ? csvProblems(error.fields) : [];
  return (
    <div className="flex flex-col gap-2">
      <div className="flex flex-wrap items-center gap-3">
        <input
          ref={inputRef}
          id={`${id}-file`}
          type="file"
          accept=".csv,text/csv"
          aria-label="Plate CSV file"
          className="sr-only"
          tabIndex={-1}
          onChange={(e) => {
            const file = e.target.files?.[0];
            // Cleared so that choosing the same file again (after fixing it) fires again.
            e.target.value = '';
            if (file) onFile(file);
          }}
        />
        <Button
          size="sm"
          onClick={() => inputRef.current?.click()}
          disabled={pending || Boolean(blockedReason)}
          aria-describedby={`${id}-explanation`}
        >
          {pending ? 'Importing…' : 'Import plate CSV'}
        </Button>
        <p id={`${id}-explanation`} className="text-xs text-ink-soft">
          {blockedReason ?? explanation}
        </p>
      </div>
      {notice && !error && (
        <p role="status" className="rounded-md bg-sage-wash px-3 py-2 text-sm text-sage-deep">
          {notice}
        </p>
      )}
      {error !== null && error !== undefined && (
        <div role="alert" className="rounded-md border border-alarm/40 bg-alarm-wash px-3 py-2 text-sm">
          <p className="font-semibold text-alarm">The plate CSV was refused; nothing was saved.</p>
          {problems.length === 0 ? (
            <p className="mt-1">{error instanceof Error ? error.message : 'The upload failed.'}</p>
          ) : (
            <table className="mt-2 w-full text-left text-sm">
              <thead className="text-xs text-ink-soft">
                <tr>
                  <th scope="col" className="py-1 pr-3 font-medium">Line</th>
                  <th scope="col" className="py-1 pr-3 font-medium">Column</th>
                  <th scope="col" className="py-1 font-medium">Problem</th>
                </tr>
              </thead>
              <tbody>
                {problems.map((p, i) => (
                  <tr key={i} className="border-t border-alarm/20 align-top">
                    <td className="py-1 pr-3 font-mono">{p.row ?? (p.field === null ? 'file' : '—')}</td>
                    <td className="py-1 pr-3 font-mono">{p.column ?? p.field ?? (p.row === null ? '—' : 'whole row')}</td>
                    <td className="py-1">{p.message}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          )}
        </div>
      )}
    </div>
  );
}
