import type { OrderReadiness } from '../orders/order-readiness';
import type { FloorBroadcast } from './floor-broadcast';

/** What follows a committed batch of station events: orders made ready, then the floor told. */
export interface EventFollowers {
  floor: FloorBroadcast;
  readiness?: OrderReadiness;
}
