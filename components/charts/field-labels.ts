// Trade names of the shot fields: one list for the whole app, in analysis/fields.ts.
export { FIELD_LABELS } from '@/analysis/fields';
