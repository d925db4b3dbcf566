import type { StationKind, BagStage } from '../names';
import type { FloorBag, FloorEvent, FloorOrder, FloorShift, FloorSpoil, FloorStation } from './floor-types';
import { orderEtas, type OrderEta } from './order-eta';
import { floorYieldFromEvents, spoilPareto, type FloorYield, type ParetoRow } from './spoil-pareto';
import { stageTimelines } from './stage-timeline';
import { shiftSoFarWindow, stationRates, type StationRate } from './station-rate';
import { taktForToday, type TodayTakt } from './takt';
import { averageHoursInStage, systemFlow, throughputByWork, type SystemFlow } from './throughput';
import { workInProgress, type WorkInProgress } from './work-in-progress';
import { workingRatesByWork } from './working-rate';
import type { AddWorkingHours } from './working-time';

/** Everything the floor numbers are computed from. */
export interface FloorInput {
  stations: FloorStation[];
  events: FloorEvent[];
  bags: FloorBag[];
  orders: FloorOrder[];
  /** Spoil reports this shift, by reason label. */
  spoils: FloorSpoil[];
  shift: FloorShift;
  /** The shop's standard good pieces per hour at a stage, used where no rate has been observed yet. */
  standardRates: Record<StationKind, number>;
  /** How hours of work fall on the clock (shifts); plain clock hours when absent. */
  addWorkingHours?: AddWorkingHours;
  /** The shift takt time plans for, when it is not `shift` (the next one, once `shift` has ended). */
  planShift?: FloorShift;
}

/** The floor board's numbers for the shift so far. */
export interface FloorNumbers {
  stations: StationRate[];
  workInProgress: WorkInProgress;
  /** Good pieces per hour finished at each stage of work, shift so far. */
  throughput: Record<StationKind, number | null>;
  hoursInStage: Record<BagStage, number | null>;
  flow: SystemFlow;
  orders: OrderEta[];
  yield: FloorYield;
  spoilReasons: ParetoRow[];
  takt: TodayTakt;
}

/** Computes the floor board's numbers; each stage's rate over its working time this shift, once it rests on enough pieces, is the observed rate behind each ETA. */
export function floorNumbers(input: FloorInput): FloorNumbers {
  const soFar = shiftSoFarWindow(input.shift, input.events);
  const timelines = stageTimelines(input.bags, input.events);
  const throughput = throughputByWork(input.events, soFar);
  return {
    stations: stationRates(input.stations, input.events, input.shift),
    workInProgress: workInProgress(input.bags),
    throughput,
    hoursInStage: averageHoursInStage(timelines, soFar),
    flow: systemFlow(timelines, soFar),
    orders: orderEtas(input.orders, input.bags, workingRatesByWork(input.events, soFar), input.standardRates, Date.parse(input.shift.now), input.addWorkingHours),
    yield: floorYieldFromEvents(input.events, soFar),
    spoilReasons: spoilPareto(input.spoils),
    takt: taktForToday(input.planShift ?? input.shift, input.orders, input.bags),
  };
}
