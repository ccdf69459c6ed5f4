export * from './roles';
export * from './abilities';
export * from './users';
export * from './auth';
export * from './http';
export * from './analysis';
export * from './projects';
export * from './calculations';
