import type { QueryInterface } from 'sequelize';

/** Reviews and approvals, threaded comments with mentions, and the outgoing e-mail log. */
export async function up(_qi: QueryInterface): Promise<void> {}

export async function down(_qi: QueryInterface): Promise<void> {}
