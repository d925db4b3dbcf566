import type { OrderDetail } from '../../src/shared/intake-contract';
import { SIZES } from '../../src/shared/intake-contract';
import { bagUrl } from './bag-qr';

/** What one printed bag label says. */
export interface BagLabel {
  code: string;
  url: string;
  customerName: string;
  due: string;
  jobName: string;
  films: string;
  fabric: string;
  garment: string;
  placement: string;
  pieces: number;
  sizes: string;
  bagOf: string;
}

const PLACEMENT_WORDS: Record<string, string> = {
  left_chest: 'Left chest',
  full_front: 'Full front',
  full_back: 'Full back',
  sleeve: 'Sleeve',
  nape: 'Nape',
  custom: 'Custom',
};

const sizeRank = (size: string) => {
  const i = (SIZES as readonly string[]).indexOf(size);
  return i < 0 ? SIZES.length : i;
};

/** The labels of an order's bags (or of one bag), in code order, with due dates in the shop's time zone. */
export function bagLabels(order: OrderDetail, origin: string, timeZone: string, onlyBagId?: number): BagLabel[] {
  const due = new Intl.DateTimeFormat('en-GB', { timeZone, weekday: 'short', day: 'numeric', month: 'short', year: 'numeric', hour: '2-digit', minute: '2-digit' }).format(new Date(order.dueAt));
  return order.bags
    .filter((bag) => onlyBagId === undefined || bag.id === onlyBagId)
    .map((bag) => {
      const job = order.jobs.find((j) => j.id === bag.jobId)!;
      const jobBags = order.bags.filter((b) => b.jobId === bag.jobId);
      return {
        code: bag.code,
        url: bagUrl(origin, bag.token),
        customerName: order.customer.name,
        due,
        jobName: job.name,
        films: job.layers.map((layer) => `${layer.position}. ${layer.filmName}, ${layer.colour}`).join('; '),
        fabric: job.fabric.name,
        garment: job.garment,
        placement: `${PLACEMENT_WORDS[job.placement] ?? job.placement}, ${job.designWidthMm} x ${job.designHeightMm} mm`,
        pieces: bag.pieces,
        sizes: Object.entries(bag.sizes)
          .sort(([a], [b]) => sizeRank(a) - sizeRank(b))
          .map(([size, n]) => `${size} ${n}`)
          .join('  '),
        bagOf: `Bag ${jobBags.indexOf(bag) + 1} of ${jobBags.length} for this job`,
      };
    });
}
