import { EnvironmentProviders, inject, provideEnvironmentInitializer } from '@angular/core';
import { MatIconRegistry } from '@angular/material/icon';
import { DomSanitizer } from '@angular/platform-browser';
import backspace from '@material-symbols/svg-400/rounded/backspace.svg';
import badge from '@material-symbols/svg-400/rounded/badge.svg';
import check from '@material-symbols/svg-400/rounded/check.svg';
import cleaningServices from '@material-symbols/svg-400/rounded/cleaning_services.svg';
import contentCut from '@material-symbols/svg-400/rounded/content_cut.svg';
import dialpad from '@material-symbols/svg-400/rounded/dialpad.svg';
import error from '@material-symbols/svg-400/rounded/error.svg';
import iron from '@material-symbols/svg-400/rounded/iron.svg';
import keyboardReturn from '@material-symbols/svg-400/rounded/keyboard_return.svg';
import link from '@material-symbols/svg-400/rounded/link.svg';
import linkOff from '@material-symbols/svg-400/rounded/link_off.svg';
import login from '@material-symbols/svg-400/rounded/login.svg';
import logout from '@material-symbols/svg-400/rounded/logout.svg';
import package2 from '@material-symbols/svg-400/rounded/package_2.svg';
import person from '@material-symbols/svg-400/rounded/person.svg';
import qrCodeScanner from '@material-symbols/svg-400/rounded/qr_code_scanner.svg';
import tabletAndroid from '@material-symbols/svg-400/rounded/tablet_android.svg';
import arrowBack from '@material-symbols/svg-400/rounded/arrow_back.svg';
import close from '@material-symbols/svg-400/rounded/close.svg';
import add from '@material-symbols/svg-400/rounded/add.svg';
import arrowDownward from '@material-symbols/svg-400/rounded/arrow_downward.svg';
import arrowUpward from '@material-symbols/svg-400/rounded/arrow_upward.svg';
import callSplit from '@material-symbols/svg-400/rounded/call_split.svg';
import cancel from '@material-symbols/svg-400/rounded/cancel.svg';
import deleteIcon from '@material-symbols/svg-400/rounded/delete.svg';
import download from '@material-symbols/svg-400/rounded/download.svg';
import edit from '@material-symbols/svg-400/rounded/edit.svg';
import print from '@material-symbols/svg-400/rounded/print.svg';
import receiptLong from '@material-symbols/svg-400/rounded/receipt_long.svg';
import search from '@material-symbols/svg-400/rounded/search.svg';
import uploadFile from '@material-symbols/svg-400/rounded/upload_file.svg';
import warning from '@material-symbols/svg-400/rounded/warning.svg';

/** Every icon the app shows, by the name templates use in `svgIcon`. Only these are bundled. */
const ICONS: Readonly<Record<string, string>> = {
  'arrow-back': arrowBack,
  backspace,
  badge,
  check,
  clear: close,
  dialpad,
  error,
  'keyboard-return': keyboardReturn,
  link,
  'link-off': linkOff,
  login,
  logout,
  person,
  'qr-scan': qrCodeScanner,
  tablet: tabletAndroid,
  'station-cut': contentCut,
  'station-weed': cleaningServices,
  'station-press': iron,
  'station-pack': package2,
  add,
  'arrow-down': arrowDownward,
  'arrow-up': arrowUpward,
  cancel,
  delete: deleteIcon,
  download,
  edit,
  orders: receiptLong,
  print,
  search,
  split: callSplit,
  'upload-file': uploadFile,
  warning,
};

/** Registers Dwell's bundled SVG icons; nothing is fetched at run time. */
export function provideDwellIcons(): EnvironmentProviders {
  return provideEnvironmentInitializer(() => {
    const registry = inject(MatIconRegistry);
    const sanitizer = inject(DomSanitizer);
    for (const [name, svg] of Object.entries(ICONS)) {
      // The SVGs are build-time files from an installed package, not user input.
      registry.addSvgIconLiteral(name, sanitizer.bypassSecurityTrustHtml(svg));
    }
  });
}
