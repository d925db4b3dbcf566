import path from 'node:path';

/** The project's root folder, where package.json lives. */
export const projectRoot = path.resolve(__dirname, '..', '..');

/** Git-ignored folder for everything the hub writes at run time: database files, uploads, secrets. */
export const varDir = path.join(projectRoot, 'var');

/** The built Angular app that the hub serves. */
export const browserDist = path.join(projectRoot, 'dist', 'dwell', 'browser');
