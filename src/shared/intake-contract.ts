import type { BagStage, StationKind } from './names';

/** Garment sizes in the order a shop counts them: youth first, then adult. */
export const SIZES = ['YXS', 'YS', 'YM', 'YL', 'YXL', 'XS', 'S', 'M', 'L', 'XL', '2XL', '3XL', '4XL', '5XL'] as const;
export type Size = (typeof SIZES)[number];

/** Where a design goes on the garment. */
export const PLACEMENTS = ['left_chest', 'full_front', 'full_back', 'sleeve', 'nape', 'custom'] as const;
export type Placement = (typeof PLACEMENTS)[number];

/** Pieces per size, e.g. { S: 4, M: 10 }. Sizes with no pieces are left out. */
export type SizeQuantities = Partial<Record<Size, number>>;

/** A customer of the shop. Contact details are for owners and leads only. */
export interface Customer {
  id: number;
  name: string;
  contactName: string;
  email: string;
  phone: string;
}

/** An order's status on the hub. */
export type OrderStatus = 'open' | 'ready' | 'collected' | 'cancelled';

/** A row of the Orders table. */
export interface OrderListItem {
  id: number;
  code: string;
  customer: { id: number; name: string };
  dueAt: string;
  status: OrderStatus;
  pieces: number;
  bagCount: number;
  /** Pieces that have reached each stage (a bag's pieces count in its current stage). */
  piecesByStage: Record<BagStage, number>;
  createdAt: string;
}

/** GET /api/orders?q=&status=&sort=dueAt|code|customer|pieces&dir=asc|desc&page=1&pageSize=20 */
export interface OrderPage {
  items: OrderListItem[];
  total: number;
  page: number;
  pageSize: number;
}

/** POST /api/orders: an existing customer by id, or a new one made inline. */
export interface OrderCreate {
  customerId?: number;
  newCustomer?: Omit<Customer, 'id'>;
  dueAt: string;
  notes?: string;
}

/** PATCH /api/orders/:id */
export interface OrderUpdate {
  customerId?: number;
  dueAt?: string;
  notes?: string;
}

/** One film layer of a job, in pressing order (position 1 goes on first). */
export interface JobLayer {
  position: number;
  filmId: number;
  filmName: string;
  colour: string;
  colourHex: string;
}

/** A personalised piece: one name and number on one garment. */
export interface RosterLine {
  id: number;
  name: string;
  number: string;
  size: Size;
  extraText: string;
  bagId: number | null;
}

/** A roster line before it is saved. */
export type RosterLineInput = Omit<RosterLine, 'id' | 'bagId'>;

/** A job as the order screen shows it. */
export interface JobDetail {
  id: number;
  name: string;
  design: { file: string; mime: string; url: string } | null;
  designWidthMm: number;
  designHeightMm: number;
  placement: Placement;
  offsetXMm: number | null;
  offsetYMm: number | null;
  garment: string;
  fabric: { id: number; name: string; maxTempC: number };
  layers: JobLayer[];
  quantities: SizeQuantities;
  pieces: number;
  personalised: boolean;
  rotationAllowed: boolean;
  rosterLines: RosterLine[];
}

/** POST /api/orders/:id/jobs */
export interface JobCreate {
  name: string;
  designFile?: string;
  designWidthMm: number;
  designHeightMm: number;
  placement: Placement;
  offsetXMm?: number;
  offsetYMm?: number;
  garment: string;
  fabricId: number;
  /** Film ids in pressing order, 1 to 4. */
  layers: number[];
  /** For plain jobs; for personalised jobs the quantities come from the roster lines. */
  quantities?: SizeQuantities;
  rosterLines?: RosterLineInput[];
  rotationAllowed?: boolean;
}

/** A bag as lists show it. */
export interface BagSummary {
  id: number;
  code: string;
  token: string;
  jobId: number;
  stage: BagStage;
  sizes: SizeQuantities;
  pieces: number;
  /** Good pieces out of each stage; `spoiled` is the total of `spoiledAt`, the pieces spoiled by the stage they were spoiled at. */
  counts: { cut: number; weeded: number; pressed: number; packed: number; spoiled: number; spoiledAt: Record<StationKind, number> };
  remakeCount: number;
  overCount: boolean;
}

/** GET /api/orders/:id */
export interface OrderDetail {
  id: number;
  code: string;
  customer: Customer;
  dueAt: string;
  status: OrderStatus;
  notes: string;
  jobs: JobDetail[];
  bags: BagSummary[];
}

/** POST /api/designs (multipart field "design"): the stored design and the size read from it, if any. */
export interface DesignUpload {
  file: string;
  mime: 'image/svg+xml' | 'image/png';
  url: string;
  widthMm: number | null;
  heightMm: number | null;
}

/** POST /api/jobs/:id/bags */
export interface BagSplitRequest {
  maxPieces?: number;
}

/**
 * GET /api/bags/by-token/:token: everything a station needs about one bag. Holds no customer
 * contact data, so operators may read it.
 */
export interface BagTicket {
  bag: BagSummary;
  order: { id: number; code: string; dueAt: string; customerName: string };
  job: Omit<JobDetail, 'rosterLines'>;
  rosterLines: RosterLine[];
}

/** Films and fabrics to choose from on the job form. */
export interface FilmOption {
  id: number;
  filmTypeId: number;
  filmTypeName: string;
  colour: string;
  colourHex: string;
  wearClass: number;
}

export interface FabricOption {
  id: number;
  name: string;
  maxTempC: number;
}

/** The station kinds that work a bag, in order, for labels and tickets. */
export const BAG_ROUTE: readonly StationKind[] = ['cut', 'weed', 'press', 'pack'];
