import type { QueryInterface } from 'sequelize';

/** Trade studies: definitions, cases and their results. */
export async function up(_qi: QueryInterface): Promise<void> {}

export async function down(_qi: QueryInterface): Promise<void> {}
