import type { Db, FabricRow, JobRow, RosterLineRow } from '../db/tables';

/** A job layer with its film and film type, in pressing order. */
export interface LayerWithFilm {
  job_id: number;
  position: number;
  film_id: number;
  colour: string;
  colour_hex: string;
  film_type_name: string;
}

/** A job with everything the order screen and the bag ticket show. */
export interface JobRecord {
  job: JobRow;
  fabric: FabricRow;
  layers: LayerWithFilm[];
  rosterLines: RosterLineRow[];
}

/** What is stored for a new job. */
export interface NewJob {
  row: Omit<JobRow, 'id' | 'created_at' | 'quantities'> & { quantities: Record<string, number> };
  filmIds: number[];
  rosterLines: Pick<RosterLineRow, 'name' | 'number' | 'size' | 'extra_text'>[];
}

/** Database access for jobs, their layers and roster lines. */
export class JobsRepository {
  constructor(private readonly db: Db) {}

  /** One job row. */
  find(id: number): Promise<JobRow | undefined> {
    return this.db('jobs').where({ id }).first();
  }

  /** The jobs of some orders (or the given job ids) with fabric, layers and roster lines, oldest first. */
  async records(where: { orderId?: number; jobIds?: number[] }): Promise<JobRecord[]> {
    const query = this.db('jobs').orderBy('id');
    if (where.orderId !== undefined) query.where({ order_id: where.orderId });
    if (where.jobIds) query.whereIn('id', where.jobIds);
    const jobs: JobRow[] = await query;
    if (jobs.length === 0) return [];
    const ids = jobs.map((job) => job.id);
    const [fabrics, layers, lines] = await Promise.all([
      this.db('fabrics').whereIn('id', [...new Set(jobs.map((job) => job.fabric_id))]),
      this.db('job_layers')
        .join('films', 'films.id', 'job_layers.film_id')
        .join('film_types', 'film_types.id', 'films.film_type_id')
        .whereIn('job_layers.job_id', ids)
        .orderBy([{ column: 'job_layers.job_id' }, { column: 'job_layers.position' }])
        .select<LayerWithFilm[]>('job_layers.job_id', 'job_layers.position', 'job_layers.film_id', 'films.colour', 'films.colour_hex', 'film_types.name as film_type_name'),
      this.db('roster_lines').whereIn('job_id', ids).orderBy([{ column: 'job_id' }, { column: 'position' }]),
    ]);
    const fabricById = new Map(fabrics.map((fabric) => [fabric.id, fabric]));
    return jobs.map((job) => ({
      job,
      fabric: fabricById.get(job.fabric_id)!,
      layers: layers.filter((layer) => layer.job_id === job.id),
      rosterLines: lines.filter((line) => line.job_id === job.id),
    }));
  }

  /** Stores a job with its layers and roster lines in one transaction; answers the new id. */
  insert(job: NewJob): Promise<number> {
    return this.db.transaction(async (trx) => {
      const [jobId] = await trx('jobs').insert({ ...job.row, quantities: trx.raw('?', [JSON.stringify(job.row.quantities)]) as never });
      await trx('job_layers').insert(job.filmIds.map((filmId, i) => ({ job_id: jobId!, position: i + 1, film_id: filmId })));
      if (job.rosterLines.length > 0) {
        // Batches keep each INSERT well under MariaDB's packet limit for a 5,000-line roster.
        await trx.batchInsert(
          'roster_lines',
          job.rosterLines.map((line, i) => ({ ...line, job_id: jobId!, bag_id: null, position: i + 1 })),
          500,
        );
      }
      return jobId!;
    });
  }

  /** Deletes a job; its layers, bags and roster lines go with it (foreign keys cascade). */
  async delete(id: number): Promise<void> {
    await this.db('jobs').where({ id }).del();
  }
}
