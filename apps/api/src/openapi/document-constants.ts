import { EXPORT_CAUTION } from '@photon-ledger/srp-core';

export { apiErrorSchema } from '@photon-ledger/shared';
/** The caution every result carries, repeated in the API description. */
export const EXPORT_CAUTION_TEXT = EXPORT_CAUTION;
