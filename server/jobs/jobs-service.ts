import type { JobDetail, Size, SizeQuantities } from '../../src/shared/intake-contract';
import { countPieces } from '../../src/shared/intake/bag-split';
import { validateRosterRow } from '../../src/shared/intake/roster-csv';
import { BagsRepository } from '../bags/bags-repository';
import type { Env } from '../config/env';
import { DesignStore, designsDir } from '../designs/design-store';
import type { Db } from '../db/tables';
import { badRequest, conflict, notFound } from '../http/http-error';
import { MaterialsRepository } from '../materials/materials-repository';
import { OrdersRepository } from '../orders/orders-repository';
import type { JobCreateInput } from './job-schemas';
import { toJobDetail } from './job-view';
import { JobsRepository } from './jobs-repository';

/** Most pieces one job may hold (a bag's piece count is a small integer on the hub). */
export const MAX_JOB_PIECES = 10000;

/** Jobs: adding one to an order (plain or personalised from a roster) and removing one. */
export class JobsService {
  private readonly jobs: JobsRepository;
  private readonly orders: OrdersRepository;
  private readonly materials: MaterialsRepository;
  private readonly bags: BagsRepository;
  private readonly designs: DesignStore;

  constructor(db: Db, uploadsDir: Env['UPLOADS_DIR']) {
    this.jobs = new JobsRepository(db);
    this.orders = new OrdersRepository(db);
    this.materials = new MaterialsRepository(db);
    this.bags = new BagsRepository(db);
    this.designs = new DesignStore(designsDir(uploadsDir));
  }

  /** Adds a job to an open order; roster lines are re-checked with the same rules as the preview. */
  async create(orderId: number, input: JobCreateInput): Promise<JobDetail> {
    const order = await this.orders.find(orderId);
    if (!order) throw notFound(`There is no order ${orderId}. Go back to Orders and pick one from the list.`);
    if (order.status !== 'open') throw conflict(`Order ${order.code} is ${order.status}; jobs can only be added to an open order.`);
    if (!(await this.materials.fabric(input.fabricId))) {
      throw badRequest(`There is no fabric ${input.fabricId}. Pick the fabric from the list.`, [{ path: 'fabricId', message: 'No such fabric.' }]);
    }
    const films = await this.materials.films(input.layers);
    const missing = input.layers.filter((id) => !films.some((film) => film.id === id));
    if (missing.length) throw badRequest(`There is no film ${missing.join(', ')}. Pick each layer's film from the list.`, [{ path: 'layers', message: 'No such film.' }]);

    let design: { file: string; mime: string } | null = null;
    if (input.designFile) {
      if (!(await this.designs.pathOf(input.designFile))) throw badRequest('The design file is not on the hub. Upload the design again.', [{ path: 'designFile', message: 'Not found.' }]);
      design = { file: input.designFile, mime: input.designFile.endsWith('.svg') ? 'image/svg+xml' : 'image/png' };
    }

    const personalised = (input.rosterLines?.length ?? 0) > 0;
    const lines = personalised ? this.checkedRoster(input) : [];
    const quantities: SizeQuantities = personalised ? quantitiesOf(lines.map((line) => line.size as Size)) : dropZeros(input.quantities ?? {});
    const pieces = countPieces(quantities);
    if (pieces === 0) throw badRequest('The job has no pieces. Enter a quantity for at least one size, or import a roster.', [{ path: 'quantities', message: 'No pieces.' }]);
    if (pieces > MAX_JOB_PIECES) throw badRequest(`A job holds at most ${MAX_JOB_PIECES} pieces. Split it into several jobs.`, [{ path: 'quantities', message: 'Too many pieces.' }]);

    const jobId = await this.jobs.insert({
      row: {
        order_id: orderId,
        name: input.name,
        design_file: design?.file ?? null,
        design_mime: design?.mime ?? null,
        design_width_mm: input.designWidthMm,
        design_height_mm: input.designHeightMm,
        placement: input.placement,
        offset_x_mm: input.offsetXMm ?? null,
        offset_y_mm: input.offsetYMm ?? null,
        garment: input.garment,
        fabric_id: input.fabricId,
        quantities: quantities as Record<string, number>,
        personalised,
        rotation_allowed: input.rotationAllowed,
      },
      filmIds: input.layers,
      rosterLines: lines.map((line) => ({ name: line.name, number: line.number, size: line.size, extra_text: line.extraText })),
    });
    const [record] = await this.jobs.records({ jobIds: [jobId] });
    return toJobDetail(record!);
  }

  /** Removes a job while none of its bags has left the queue. */
  async delete(jobId: number): Promise<void> {
    const job = await this.jobs.find(jobId);
    if (!job) throw notFound(`There is no job ${jobId}. Reload the order.`);
    if ((await this.bags.countPastQueued({ jobId })) > 0) {
      throw conflict('This job has bags already on the floor (cut or later), so it cannot be removed. Cancel the order instead, or finish the bags.');
    }
    await this.jobs.delete(jobId);
  }

  private checkedRoster(input: JobCreateInput) {
    // Without a letter height the width rule cannot be applied; the other rules still are.
    const rules = input.letterHeightMm
      ? { placementWidthMm: input.designWidthMm, letterHeightMm: input.letterHeightMm }
      : { placementWidthMm: Number.POSITIVE_INFINITY, letterHeightMm: 0 };
    const checked = input.rosterLines!.map((line, i) => validateRosterRow({ line: i + 1, ...line }, rules));
    const bad = checked.flatMap((row, i) => row.errors.map((message) => ({ path: `rosterLines.${i}`, message })));
    if (bad.length) {
      throw badRequest(`${new Set(bad.map((b) => b.path)).size} roster line(s) need fixing before the job can be saved (line ${checked.findIndex((r) => r.errors.length) + 1}: ${bad[0]!.message})`, bad);
    }
    return checked;
  }
}

function quantitiesOf(sizes: Size[]): SizeQuantities {
  const quantities: SizeQuantities = {};
  for (const size of sizes) quantities[size] = (quantities[size] ?? 0) + 1;
  return quantities;
}

function dropZeros(quantities: SizeQuantities): SizeQuantities {
  return Object.fromEntries(Object.entries(quantities).filter(([, n]) => (n ?? 0) > 0)) as SizeQuantities;
}
