import { ComponentFixture, TestBed } from '@angular/core/testing';
import { HttpTestingController } from '@angular/common/http/testing';
import QRCode from 'qrcode';
import type { BagSummary, OrderDetail } from '../../shared/intake-contract';
import { LabelSheet } from './label-sheet';
import { PRINT_PAGE } from './print-page';
import { readDrawnQr } from './bag-qr-testing';
import { screenTestProviders } from '../core/screen-testing';

const TOKEN_A = 'a'.repeat(20) + '_' + 'B'.repeat(22);
const TOKEN_B = 'c'.repeat(20) + '-' + 'D'.repeat(22);

function bag(id: number, code: string, token: string): BagSummary {
  return {
    id,
    code,
    token,
    jobId: 9,
    stage: 'queued',
    sizes: { M: 10, L: 14 },
    pieces: 24,
    counts: { cut: 0, weeded: 0, pressed: 0, packed: 0, spoiled: 0, spoiledAt: { cut: 0, weed: 0, press: 0, pack: 0 } },
    remakeCount: 0,
    overCount: false,
  };
}

const ORDER: OrderDetail = {
  id: 7,
  code: 'BY-1007',
  customer: { id: 1, name: 'Hollinford Otters Swim Club', contactName: '', email: '', phone: '' },
  dueAt: '2031-05-14T15:00:00Z',
  status: 'open',
  notes: '',
  jobs: [
    {
      id: 9,
      name: 'Club crest',
      design: null,
      designWidthMm: 100,
      designHeightMm: 80,
      placement: 'left_chest',
      offsetXMm: null,
      offsetYMm: null,
      garment: 'Cotton tee',
      fabric: { id: 1, name: 'Cotton', maxTempC: 200 },
      layers: [{ position: 1, filmId: 2, filmName: 'Smooth PU', colour: 'Navy', colourHex: '#1b2a4a' }],
      quantities: { M: 20, L: 28 },
      pieces: 48,
      personalised: false,
      rotationAllowed: true,
      rosterLines: [],
    },
  ],
  bags: [bag(1, 'BY-1007-01', TOKEN_A), bag(2, 'BY-1007-02', TOKEN_B)],
};

describe('LabelSheet', () => {
  let fixture: ComponentFixture<LabelSheet>;
  let http: HttpTestingController;
  let print: jest.Mock;
  let create: jest.SpyInstance;

  const element = () => fixture.nativeElement as HTMLElement;

  async function settle(): Promise<void> {
    await new Promise((resolve) => setTimeout(resolve));
    await fixture.whenStable();
  }

  beforeEach(async () => {
    print = jest.fn();
    create = jest.spyOn(QRCode, 'create');
    TestBed.configureTestingModule({
      imports: [LabelSheet],
      providers: [
        ...screenTestProviders(),
        { provide: PRINT_PAGE, useValue: print },
      ],
    });
    http = TestBed.inject(HttpTestingController);
    fixture = TestBed.createComponent(LabelSheet);
    fixture.componentRef.setInput('id', '7');
    await settle();
    http.expectOne({ method: 'GET', url: '/api/orders/7' }).flush(ORDER);
    await settle();
  });

  afterEach(() => {
    http.verify();
    create.mockRestore();
  });

  it('renders one label per bag with its code in large type', () => {
    const labels = element().querySelectorAll('[data-testid=bag-label]');
    const codes = Array.from(element().querySelectorAll('[data-testid=bag-code]'), (code) => code.textContent?.trim());

    expect(labels).toHaveLength(2);
    expect(codes).toEqual(['BY-1007-01', 'BY-1007-02']);
    expect(labels[0].textContent).toContain('Hollinford Otters Swim Club');
    expect(labels[0].textContent).toContain('Smooth PU Navy');
    expect(labels[0].textContent).toContain('M 10');
  });

  it('makes each QR code from the bag\'s address on this hub at error correction level M', () => {
    expect(create).toHaveBeenCalledWith(`${location.origin}/bag/${TOKEN_A}`, { errorCorrectionLevel: 'M' });
    expect(create).toHaveBeenCalledWith(`${location.origin}/bag/${TOKEN_B}`, { errorCorrectionLevel: 'M' });
  });

  it('draws a QR code that an independent decoder reads back as the bag address', () => {
    // jsQR implements ISO/IEC 18004 decoding separately from the qrcode package that drew the symbol.
    const svgs = element().querySelectorAll<SVGSVGElement>('dw-bag-qr svg');

    expect(readDrawnQr(svgs[0])).toBe(`${location.origin}/bag/${TOKEN_A}`);
    expect(readDrawnQr(svgs[1])).toBe(`${location.origin}/bag/${TOKEN_B}`);
  });

  it('prints through the print token and links each stock\'s PDF', () => {
    element().querySelector<HTMLButtonElement>('[data-testid=print]')!.click();

    expect(print).toHaveBeenCalledTimes(1);
    expect(element().querySelector('[data-testid=pdf-a4]')?.getAttribute('href')).toBe('/api/orders/7/labels.pdf?stock=a4');
    expect(element().querySelector('[data-testid=pdf-4x6]')?.getAttribute('href')).toBe('/api/orders/7/labels.pdf?stock=4x6');
  });
});
