import { ComponentFixture, TestBed } from '@angular/core/testing';
import { importProvidersFrom, provideZonelessChangeDetection, signal } from '@angular/core';
import { provideRouter } from '@angular/router';
import { MatIconTestingModule } from '@angular/material/icon/testing';
import { Session, type StationKind } from '../auth/session';
import { navEntriesFor } from '../shell/nav-entries';
import { StationHome } from './station-home';

/** The screen each station kind works a bag on, as the station screens are routed. */
const MAIN_SCREEN: Record<StationKind, string> = { cut: '/cut-station', weed: '/weed', press: '/press', pack: '/pack' };

describe('StationHome', () => {
  let fixture: ComponentFixture<StationHome>;

  async function openAt(station: { id: number; name: string; kind: StationKind } | null): Promise<void> {
    TestBed.configureTestingModule({
      imports: [StationHome],
      providers: [
        provideZonelessChangeDetection(),
        provideRouter([]),
        importProvidersFrom(MatIconTestingModule),
        {
          provide: Session,
          useValue: {
            user: signal({ id: 7, name: 'Ada Fenwick', email: '', role: 'operator' as const }),
            station: signal(station),
            role: signal('operator' as const),
          },
        },
      ],
    });
    fixture = TestBed.createComponent(StationHome);
    await fixture.whenStable();
  }

  const root = () => fixture.nativeElement as HTMLElement;
  const buttons = () => [...root().querySelectorAll<HTMLAnchorElement>('[data-testid="station-home-screen"]')];
  const byTestId = (id: string) => root().querySelector<HTMLElement>(`[data-testid="${id}"]`);

  it('names the station and who is signed in, and no longer promises scanning for later', async () => {
    await openAt({ id: 2, name: 'Press 1', kind: 'press' });

    expect(byTestId('station-name')!.textContent).toBe('Press 1');
    expect(root().textContent).toContain('Press station');
    expect(byTestId('station-home-person')!.textContent).toContain('Ada Fenwick');
    expect(root().textContent).not.toMatch(/comes to this screen next/i);
  });

  it.each(['cut', 'weed', 'press', 'pack'] as const)('offers a %s station big buttons to the same screens as its top bar, its own screen first', async (kind) => {
    await openAt({ id: 1, name: `${kind} bench`, kind });

    const hrefs = buttons().map((a) => a.getAttribute('href'));
    expect(hrefs[0]).toBe(MAIN_SCREEN[kind]);
    expect([...hrefs].sort()).toEqual(navEntriesFor('operator', kind).map((entry) => entry.path).sort());
    expect(hrefs).toContain('/spoil');
    expect(buttons().every((a) => a.classList.contains('dw-primary-action'))).toBe(true);
    expect(buttons().map((a) => a.textContent?.trim())).toEqual(hrefs.map((href) => navEntriesFor('operator', kind).find((e) => e.path === href)!.label));
  });

  it('shows the hot platen and pinch point cautions at a press, with the workplace rules', async () => {
    await openAt({ id: 2, name: 'Press 1', kind: 'press' });

    const cautions = byTestId('station-home-cautions')!.textContent!;
    expect(cautions).toMatch(/Hot platen/);
    expect(cautions).toMatch(/Pinch point/);
    expect(cautions).toMatch(/local workplace safety rules/);
  });

  it('shows the sharp blade caution at a cut station and none at the pack bench', async () => {
    await openAt({ id: 1, name: 'Cut 1', kind: 'cut' });
    expect(byTestId('station-home-cautions')!.textContent).toMatch(/Sharp blade/);

    TestBed.resetTestingModule();
    await openAt({ id: 6, name: 'Pack 1', kind: 'pack' });
    expect(byTestId('station-home-cautions')).toBeNull();
  });

  it('says how to sign in at a station when the session has none, with no screen buttons', async () => {
    await openAt(null);

    expect(root().querySelector('h1')!.textContent).toBe('No station');
    expect(root().textContent).toContain('Sign in on a station tablet with your PIN.');
    expect(buttons()).toEqual([]);
  });
});
