import { StationKind } from '../auth/session';

/** How each station kind is labelled and drawn. */
export const KIND_DISPLAY: Readonly<Record<StationKind, { label: string; icon: string }>> = {
  cut: { label: 'Cut', icon: 'station-cut' },
  weed: { label: 'Weed', icon: 'station-weed' },
  press: { label: 'Press', icon: 'station-press' },
  pack: { label: 'Pack', icon: 'station-pack' },
};
