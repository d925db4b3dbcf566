import { importProvidersFrom, provideZonelessChangeDetection, type EnvironmentProviders, type Provider } from '@angular/core';
import { provideHttpClient } from '@angular/common/http';
import { provideHttpClientTesting } from '@angular/common/http/testing';
import { MatIconTestingModule } from '@angular/material/icon/testing';
import { provideRouter } from '@angular/router';

/** What a screen's spec needs around it: zoneless change detection, an empty router, the testing HTTP backend and stand-in icons. */
export function screenTestProviders(): (Provider | EnvironmentProviders)[] {
  return [provideZonelessChangeDetection(), provideRouter([]), provideHttpClient(), provideHttpClientTesting(), importProvidersFrom(MatIconTestingModule)];
}
