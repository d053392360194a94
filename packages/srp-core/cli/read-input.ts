import { readFileSync } from 'node:fs';
import path from 'node:path';
import type { z } from 'zod';
import { CliError, parseWith } from './cli-error';

/** The folder the user typed the command in (pnpm runs scripts from the package folder). */
export function userCwd(): string {
  return process.env.INIT_CWD ?? process.cwd();
}

/** Reads a text file named on the command line; a missing file is a CliError naming the option. */
export function readText(file: string, option: string): string {
  const full = path.resolve(userCwd(), file);
  try {
    return readFileSync(full, 'utf8');
  } catch (err) {
    throw new CliError(`${option}: cannot read ${full}: ${(err as NodeJS.ErrnoException).code ?? String(err)}`);
  }
}

/** Reads a JSON file and validates it with a shared schema; messages name the file and the field. */
export function readJson<S extends z.ZodType>(schema: S, file: string, option: string): z.infer<S> {
  const text = readText(file, option);
  let value: unknown;
  try {
    value = JSON.parse(text);
  } catch (err) {
    throw new CliError(`${option}: ${file} is not valid JSON: ${(err as Error).message}`);
  }
  return parseWith(schema, value, `${option} ${file}`);
}
