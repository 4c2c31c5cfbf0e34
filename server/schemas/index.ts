// Shared contracts: zod only. Imported by the server (validation) and the app (types, forms).
export * from './common';
export * from './auth';
export * from './players';
export * from './fittings';
export * from './team';
export * from './bay-files';
export * from './analysis';
export * from './build-spec';
export * from './bags';
export * from './spec-sheets';
export * from './workshop-settings';
export * from './shop-margins';
export * from './fitting-course';
export * from './shops';
