import type { Db } from '../db/tables';
import { notFound } from '../http/http-error';
import { OrdersService } from '../orders/orders-service';
import { bagLabels } from './bag-label';
import { labelsPdf, type LabelStock } from './label-pdf';
import { labelSvg } from './label-svg';
import { LabelsRepository } from './labels-repository';

/** Bag labels: a printable PDF for an order's bags and an SVG for one bag. */
export class LabelsService {
  private readonly orders: OrdersService;
  private readonly labels: LabelsRepository;

  constructor(db: Db) {
    this.orders = new OrdersService(db);
    this.labels = new LabelsRepository(db);
  }

  /** The PDF of every bag label of an order, and the order's code for the file name. */
  async orderPdf(orderId: number, stock: LabelStock, origin: string): Promise<{ code: string; pdf: Uint8Array }> {
    const order = await this.orders.detail(orderId);
    const labels = bagLabels(order, origin, await this.labels.shopTimeZone());
    return { code: order.code, pdf: await labelsPdf(labels, stock) };
  }

  /** One bag's label as SVG. */
  async bagSvg(bagId: number, origin: string): Promise<{ code: string; svg: string }> {
    const orderId = await this.labels.orderIdOfBag(bagId);
    if (orderId === null) throw notFound(`There is no bag ${bagId}. Reload the order.`);
    const [label] = bagLabels(await this.orders.detail(orderId), origin, await this.labels.shopTimeZone(), bagId);
    return { code: label!.code, svg: await labelSvg(label!) };
  }
}
