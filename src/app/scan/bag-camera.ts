import { ChangeDetectionStrategy, Component, InjectionToken, computed, inject, output, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { ZXingScannerModule } from '@zxing/ngx-scanner';
import { BarcodeFormat } from '@zxing/library';
import { BROWSER_STORAGE } from '../core/browser-storage';

/** Storage key of the camera this tablet scans with. */
export const SCAN_CAMERA_KEY = 'dwell.scanCamera';

/** The browser's cameras, or null where there are none to ask for (plain-http addresses hide them). */
export const MEDIA_DEVICES = new InjectionToken<MediaDevices | null>('MEDIA_DEVICES', {
  providedIn: 'root',
  factory: () => globalThis.navigator?.mediaDevices ?? null,
});

/** The tablet camera reading bag QR codes; loaded only when a person asks for the camera. */
@Component({
  selector: 'dw-bag-camera',
  imports: [ZXingScannerModule, MatButtonModule, MatIconModule],
  templateUrl: './bag-camera.html',
  styleUrl: './bag-camera.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class BagCamera {
  private readonly storage = inject(BROWSER_STORAGE);
  private lastText = '';
  private lastAt = 0;

  /** The text of a QR code the camera read (each code once per two seconds). */
  readonly decoded = output<string>();

  protected readonly available = inject(MEDIA_DEVICES) !== null;
  protected readonly formats = [BarcodeFormat.QR_CODE];
  protected readonly cameras = signal<MediaDeviceInfo[]>([]);
  protected readonly chosenId = signal<string | null>(this.storage.getItem(SCAN_CAMERA_KEY));
  protected readonly device = computed(() => {
    const cameras = this.cameras();
    return cameras.find((camera) => camera.deviceId === this.chosenId()) ?? cameras.at(-1);
  });
  protected readonly torchPossible = signal(false);
  protected readonly torchOn = signal(false);
  protected readonly problem = signal<string | null>(null);

  protected camerasFound(cameras: MediaDeviceInfo[]): void {
    this.cameras.set(cameras);
  }

  protected chooseCamera(camera: MediaDeviceInfo): void {
    this.chosenId.set(camera.deviceId);
    this.storage.setItem(SCAN_CAMERA_KEY, camera.deviceId);
  }

  protected toggleTorch(): void {
    this.torchOn.update((on) => !on);
  }

  protected permissionAnswered(allowed: boolean): void {
    if (!allowed) this.problem.set('The camera is blocked for Dwell on this tablet. Allow it in the browser settings, or use the scanner or type the code.');
  }

  protected noCamera(): void {
    this.problem.set('This tablet has no camera Dwell can use. Use the USB scanner or type the bag code.');
  }

  protected codeRead(text: string): void {
    const now = Date.now();
    if (text === this.lastText && now - this.lastAt < 2000) return;
    this.lastText = text;
    this.lastAt = now;
    this.decoded.emit(text);
  }

  protected cameraLabel(camera: MediaDeviceInfo, index: number): string {
    return camera.label || `Camera ${index + 1}`;
  }
}
