import type { Knex } from 'knex';
import type { BagStage, EventKind, PeelKind, PressureClass, Role, StationKind } from '../../src/shared/names';

/** One row type per table, as stored. Lengths in mm, temperatures in °C, times in seconds. */
export interface ShopSettingsRow {
  id: 1;
  shop_name: string;
  address: string;
  phone: string;
  email: string;
  units: 'imperial' | 'metric';
  time_zone: string;
  bag_max_pieces: number;
  shift_start: string;
  shift_end: string;
  /** ISO weekday numbers the shift runs on, e.g. '1,2,3,4,5' (see src/shared/shop-contract.ts). */
  working_days: string;
  /** JSON list of {date: 'YYYY-MM-DD', note}: days the shift does not run although they are working days. */
  closed_days: string;
  /** Good pieces per hour planned at each stage of work before the floor has shown its own rate. */
  standard_cut_per_hour: number;
  standard_weed_per_hour: number;
  standard_press_per_hour: number;
  standard_pack_per_hour: number;
  heat_exposure_limit_s: number;
  updated_at: Date;
}

export interface UserRow {
  id: number;
  name: string;
  email: string | null;
  role: Exclude<Role, 'display'>;
  password_hash: string | null;
  pin_hash: string | null;
  active: boolean | number;
  created_at: Date;
  updated_at: Date;
}

export interface StationRow {
  id: number;
  name: string;
  kind: StationKind;
  press_id: number | null;
  cutter_id: number | null;
  device_token_hash: string | null;
  paired_at: Date | null;
  paired_by: number | null;
  last_seen_at: Date | null;
  last_sync_at: Date | null;
}

export interface DisplayRow {
  id: number;
  name: string;
  token_hash: string;
  created_by: number | null;
  created_at: Date;
  revoked_at: Date | null;
}

export interface FilmTypeRow {
  id: number;
  name: string;
  supplier: string;
  thickness_um: number;
  wear_class: 1 | 2 | 3 | 4;
  cut_force_g: number;
  cut_speed_mm_s: number;
  blade_angle_deg: number;
  low_temp_film_type_id: number | null;
  notes: string;
}

export interface FilmRow {
  id: number;
  film_type_id: number;
  colour: string;
  colour_hex: string;
}

export interface FabricRow {
  id: number;
  name: string;
  max_temp_c: number;
  notes: string;
}

export interface RecipeRow {
  id: number;
  film_type_id: number;
  fabric_id: number;
  temp_c: number;
  dwell_s: number;
  pressure_class: PressureClass;
  peel: PeelKind;
  pre_press_s: number;
  tack_s: number;
  second_press_s: number | null;
  notes: string;
  source: string;
  updated_at: Date;
}

/** One change to a recipe: the whole row before (null when created) and after, as JSON. */
export interface RecipeRevisionRow {
  id: number;
  recipe_id: number;
  changed_by: number | null;
  changed_at: Date;
  before: unknown;
  after: unknown;
}

export interface PressRow {
  id: number;
  name: string;
  kind: 'manual' | 'air';
  platen_width_mm: number;
  platen_height_mm: number;
  bore_mm: string | null;
  max_gauge_kpa: string | null;
  notes: string;
}

export interface CutterRow {
  id: number;
  name: string;
  carriage_width_mm: number;
  min_media_mm: number;
  max_media_mm: number;
  blade_installed_at: Date | null;
  blade_distance_mm: number;
  last_test_cut_at: Date | null;
  distance_at_last_test_mm: number;
  last_film_type_id: number | null;
  test_cut_every_mm: number;
}

export interface RollRow {
  id: number;
  film_id: number;
  label: string;
  width_mm: number;
  length_mm: number;
  remaining_mm: number;
  reorder_mm: number;
  rack_slot: string;
  received_at: Date;
  low_notified_at: Date | null;
  emptied_at: Date | null;
}

export interface CustomerRow {
  id: number;
  name: string;
  contact_name: string;
  email: string;
  phone: string;
  notes: string;
  created_at: Date;
}

export interface OrderRow {
  id: number;
  code: string;
  customer_id: number;
  due_at: Date;
  status: 'open' | 'ready' | 'collected' | 'cancelled';
  notes: string;
  created_by: number | null;
  created_at: Date;
  updated_at: Date;
  ready_at: Date | null;
}

export type Placement = 'left_chest' | 'full_front' | 'full_back' | 'sleeve' | 'nape' | 'custom';

export interface JobRow {
  id: number;
  order_id: number;
  name: string;
  design_file: string | null;
  design_mime: string | null;
  design_width_mm: number;
  design_height_mm: number;
  placement: Placement;
  offset_x_mm: number | null;
  offset_y_mm: number | null;
  garment: string;
  fabric_id: number;
  quantities: Record<string, number>;
  personalised: boolean | number;
  rotation_allowed: boolean | number;
  created_at: Date;
}

export interface JobLayerRow {
  id: number;
  job_id: number;
  position: number;
  film_id: number;
}

export interface BagRow {
  id: number;
  order_id: number;
  job_id: number;
  code: string;
  token: string;
  stage: BagStage;
  sizes: Record<string, number>;
  pieces: number;
  qty_cut: number;
  qty_weeded: number;
  qty_pressed: number;
  qty_packed: number;
  qty_spoiled: number;
  remake_count: number;
  over_count: boolean | number;
  version: number;
  created_at: Date;
  updated_at: Date;
}

export interface RosterLineRow {
  id: number;
  job_id: number;
  bag_id: number | null;
  position: number;
  name: string;
  number: string;
  size: string;
  extra_text: string;
}

export interface EventRow {
  id: string;
  seq: number;
  bag_id: number | null;
  station_id: number | null;
  user_id: number | null;
  kind: EventKind;
  quantity: number;
  client_at: Date;
  server_at: Date;
  payload: Record<string, unknown>;
  over_count_reason: string | null;
}

export interface SpoilReasonRow {
  id: number;
  label: string;
  position: number;
  active: boolean | number;
}

export interface SpoilRow {
  id: number;
  event_id: string;
  bag_id: number;
  stage: Exclude<StationKind, never>;
  reason_id: number;
  quantity: number;
  note: string;
  created_at: Date;
}

export interface PhotoRow {
  id: number;
  event_id: string;
  file: string;
  thumb_file: string;
  mime: string;
  bytes: number;
  created_at: Date;
}

export interface MailLogRow {
  id: number;
  kind: 'order_ready' | 'film_low' | 'shift_summary';
  to: string;
  subject: string;
  text: string;
  html: string;
  status: 'queued' | 'sent' | 'failed';
  attempts: number;
  last_error: string | null;
  message_id: string | null;
  related: Record<string, unknown>;
  created_at: Date;
  sent_at: Date | null;
  /** When the outbox may next try it; null once sent, or when it waits for a lead's retry. */
  next_attempt_at: Date | null;
}

/** One change to a roll's remaining length: received, cut (layout plus test cut) or measured. */
export interface RollMovementRow {
  id: number;
  roll_id: number;
  kind: 'received' | 'cut' | 'measure';
  change_mm: number;
  remaining_mm: number;
  cut_length_mm: number | null;
  test_cut_mm: number | null;
  cutter_id: number | null;
  user_id: number | null;
  bag_ids: number[] | null;
  note: string;
  created_at: Date;
}

/** One layer film of a bag that has been cut. */
export interface BagLayerCutRow {
  id: number;
  bag_id: number;
  film_id: number;
  roll_movement_id: number;
  cut_at: Date;
}

/** The force that last cut and weeded clean on one cutter for one film type. */
export interface CutterFilmForceRow {
  cutter_id: number;
  film_type_id: number;
  force_g: number;
  tested_at: Date;
}

declare module 'knex/types/tables' {
  interface Tables {
    shop_settings: ShopSettingsRow;
    users: UserRow;
    stations: StationRow;
    displays: DisplayRow;
    film_types: FilmTypeRow;
    films: FilmRow;
    fabrics: FabricRow;
    recipes: RecipeRow;
    recipe_revisions: RecipeRevisionRow;
    presses: PressRow;
    cutters: CutterRow;
    rolls: RollRow;
    customers: CustomerRow;
    orders: OrderRow;
    jobs: JobRow;
    job_layers: JobLayerRow;
    bags: BagRow;
    roster_lines: RosterLineRow;
    events: EventRow;
    spoil_reasons: SpoilReasonRow;
    spoils: SpoilRow;
    photos: PhotoRow;
    mail_log: MailLogRow;
    roll_movements: RollMovementRow;
    bag_layer_cuts: BagLayerCutRow;
    cutter_film_forces: CutterFilmForceRow;
  }
}

/** The hub's database handle. */
export type Db = Knex;
