import { InjectionToken } from '@angular/core';

/** Reads a file the person picked as UTF-8 text; specs replace it. */
export const READ_FILE_TEXT = new InjectionToken<(file: Blob) => Promise<string>>('READ_FILE_TEXT', {
  providedIn: 'root',
  factory: () => (file: Blob) =>
    new Promise<string>((resolve, reject) => {
      const reader = new FileReader();
      reader.onload = () => resolve(String(reader.result ?? ''));
      reader.onerror = () => reject(reader.error ?? new Error('The file could not be read.'));
      reader.readAsText(file, 'utf-8');
    }),
});
