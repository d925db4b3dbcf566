/** Dwell's own names (DESIGN.md section 8), shared by the app and the hub. */
export const ROLES = ['owner', 'lead', 'operator', 'display'] as const;
/** Who someone is to Dwell; decides what they may see and do. */
export type Role = (typeof ROLES)[number];

/** The four station kinds on the floor. */
export const STATION_KINDS = ['cut', 'weed', 'press', 'pack'] as const;
export type StationKind = (typeof STATION_KINDS)[number];

/** Where a bag is in its run, in order. */
export const BAG_STAGES = ['queued', 'cut', 'weeded', 'pressed', 'packed'] as const;
export type BagStage = (typeof BAG_STAGES)[number];

/** What a station can report about a bag. */
export const EVENT_KINDS = ['scan', 'test_cut', 'cut_done', 'weed_done', 'press_done', 'spoil', 'pack_done'] as const;
export type EventKind = (typeof EVENT_KINDS)[number];

export const PRESSURE_CLASSES = ['light', 'medium', 'firm', 'heavy'] as const;
export type PressureClass = (typeof PRESSURE_CLASSES)[number];

export const PEEL_KINDS = ['hot', 'warm', 'cold'] as const;
export type PeelKind = (typeof PEEL_KINDS)[number];
