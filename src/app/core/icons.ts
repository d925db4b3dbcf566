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
import checkBox from '@material-symbols/svg-400/rounded/check_box.svg';
import checkBoxOutlineBlank from '@material-symbols/svg-400/rounded/check_box_outline_blank.svg';
import gridView from '@material-symbols/svg-400/rounded/grid_view.svg';
import inventory2 from '@material-symbols/svg-400/rounded/inventory_2.svg';
import photoCamera from '@material-symbols/svg-400/rounded/photo_camera.svg';
import flashlightOn from '@material-symbols/svg-400/rounded/flashlight_on.svg';
import videocam from '@material-symbols/svg-400/rounded/videocam.svg';
import undo from '@material-symbols/svg-400/rounded/undo.svg';
import doneAll from '@material-symbols/svg-400/rounded/done_all.svg';
import report from '@material-symbols/svg-400/rounded/report.svg';
import remove from '@material-symbols/svg-400/rounded/remove.svg';
import acUnit from '@material-symbols/svg-400/rounded/ac_unit.svg';
import air from '@material-symbols/svg-400/rounded/air.svg';
import backHand from '@material-symbols/svg-400/rounded/back_hand.svg';
import compress from '@material-symbols/svg-400/rounded/compress.svg';
import deviceThermostat from '@material-symbols/svg-400/rounded/device_thermostat.svg';
import healthAndSafety from '@material-symbols/svg-400/rounded/health_and_safety.svg';
import history from '@material-symbols/svg-400/rounded/history.svg';
import layers from '@material-symbols/svg-400/rounded/layers.svg';
import localFireDepartment from '@material-symbols/svg-400/rounded/local_fire_department.svg';
import menuBook from '@material-symbols/svg-400/rounded/menu_book.svg';
import modeHeat from '@material-symbols/svg-400/rounded/mode_heat.svg';
import playArrow from '@material-symbols/svg-400/rounded/play_arrow.svg';
import sunny from '@material-symbols/svg-400/rounded/sunny.svg';
import timer from '@material-symbols/svg-400/rounded/timer.svg';
import volumeOff from '@material-symbols/svg-400/rounded/volume_off.svg';
import volumeUp from '@material-symbols/svg-400/rounded/volume_up.svg';
import sync from '@material-symbols/svg-400/rounded/sync.svg';
import personAdd from '@material-symbols/svg-400/rounded/person_add.svg';
import key from '@material-symbols/svg-400/rounded/key.svg';
import group from '@material-symbols/svg-400/rounded/group.svg';
import monitoring from '@material-symbols/svg-400/rounded/monitoring.svg';
import wifi from '@material-symbols/svg-400/rounded/wifi.svg';
import wifiOff from '@material-symbols/svg-400/rounded/wifi_off.svg';
import tv from '@material-symbols/svg-400/rounded/tv.svg';
import contentCopy from '@material-symbols/svg-400/rounded/content_copy.svg';
import checkCircle from '@material-symbols/svg-400/rounded/check_circle.svg';
import flag from '@material-symbols/svg-400/rounded/flag.svg';
import mail from '@material-symbols/svg-400/rounded/mail.svg';
import barChart from '@material-symbols/svg-400/rounded/bar_chart.svg';
import schedule from '@material-symbols/svg-400/rounded/schedule.svg';
import refresh from '@material-symbols/svg-400/rounded/refresh.svg';
import send from '@material-symbols/svg-400/rounded/send.svg';
import article from '@material-symbols/svg-400/rounded/article.svg';
import visibility from '@material-symbols/svg-400/rounded/visibility.svg';
import store from '@material-symbols/svg-400/rounded/store.svg';

/** Every icon the app shows, by the name templates use in `svgIcon`. Only these are bundled. */
const ICONS: Readonly<Record<string, string>> = {
  'check-box': checkBox,
  'check-box-blank': checkBoxOutlineBlank,
  'gang-planner': gridView,
  'roll-rack': inventory2,
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
  'caution-fumes': air,
  'caution-hot': localFireDepartment,
  'caution-pinch': backHand,
  'caution-rules': healthAndSafety,
  history,
  layers,
  'peel-cold': acUnit,
  'peel-hot': localFireDepartment,
  'peel-warm': sunny,
  play: playArrow,
  pressure: compress,
  'recipe-book': menuBook,
  'person-add': personAdd,
  key,
  people: group,
  sync,
  temperature: deviceThermostat,
  timer,
  'total-heat': modeHeat,
  'volume-off': volumeOff,
  'volume-on': volumeUp,
  camera: photoCamera,
  torch: flashlightOn,
  videocam,
  undo,
  'done-all': doneAll,
  spoil: report,
  remove,
  'floor-board': monitoring,
  online: wifi,
  offline: wifiOff,
  'wall-display': tv,
  copy: contentCopy,
  'on-time': checkCircle,
  flag,
  'mail-outbox': mail,
  reports: barChart,
  schedule,
  refresh,
  send,
  article,
  visibility,
  'shop-settings': store,
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
