import { resolve } from 'node:path';

// This file sits two levels below the backend folder both as src/config/paths.ts and as
// dist/config/paths.js, so the same relative step finds the repository from either.
export const BACKEND_ROOT = resolve(__dirname, '..', '..');
export const REPO_ROOT = resolve(BACKEND_ROOT, '..');
export const DEFAULT_DATABASE_PATH = resolve(REPO_ROOT, 'data', 'tiermode.sqlite');
export const FRONTEND_DIST = resolve(REPO_ROOT, 'frontend', 'dist');
