/**
 * What the engine is given: its own input types, the fields it reads and nothing else. The case
 * file's schema (src/case/v1/schema.ts) validates a file into shapes that satisfy these; the
 * engine never imports the schema, so a change of the file format reaches the engine only
 * through these types (the compiler shows each place that no longer fits).
 *
 * Every measured number is a `QuantityInput`: a plain number, or a value with its optional low and
 * high end (missing ends mean no spread on that input) and a note on where it came from, which
 * the step cites. `spread` turns one into a `Range`.
 */

/** A measured or estimated number: a plain number, or `{ value, low?, high?, note? }`. */
export type QuantityInput = number | { value: number; low?: number; high?: number; note?: string };

/** How the drag factor was obtained, with what the engine needs to compute it. */
export type DragInput =
  | { source: 'entered'; value: number; low?: number; high?: number; note?: string }
  | {
      source: 'table';
      surface?: string;
      value: number;
      low?: number;
      high?: number;
      band?: 'under-30mph' | 'over-30mph';
      note?: string;
    }
  | {
      source: 'test-skids';
      /** Each test's speed and distance; or else `factors`. */
      tests?: { speed: QuantityInput; distance: QuantityInput }[];
      /** Drag factors already worked out from the tests, one per test; or else `tests`. */
      factors?: QuantityInput[];
      /** `factors` only: true when their test grade was taken out already (level-ground factors). */
      gradeTakenOut?: boolean;
      /** Grade the tests were run on, signed percent, + uphill in their direction; default level. */
      testGrade?: QuantityInput;
      note?: string;
    }
  | { source: 'sled'; weight: QuantityInput; pulls: QuantityInput[]; note?: string }
  | { source: 'decelerometer'; readings: QuantityInput[]; note?: string };

/** The state of the brakes: every wheel, an estimated efficiency, or wheel by wheel. */
export type BrakesInput =
  | { mode: 'all' }
  | { mode: 'estimate'; efficiency: QuantityInput; basis?: string }
  | {
      mode: 'wheels';
      frontLeft: QuantityInput;
      frontRight: QuantityInput;
      rearLeft: QuantityInput;
      rearRight: QuantityInput;
    };

export interface VehicleInput {
  label?: string;
  /** Share of the weight on the front axle, 0 to 1. */
  frontAxleShare?: QuantityInput;
  trackWidth?: QuantityInput;
  brakes?: BrakesInput;
}

export interface SegmentInput {
  label?: string;
  length?: QuantityInput;
  drag: DragInput;
  /** Signed percent, + uphill in the direction of travel. */
  grade?: QuantityInput;
}

/** How a slide ended: at rest, at a known speed, or running into another analysis's marks. */
export type EndInput =
  | { mode: 'stop' }
  | { mode: 'speed'; speed: QuantityInput; basis?: string }
  | { mode: 'analysis'; analysis: string };

export interface SkidInput {
  id: string;
  kind: 'skid';
  label?: string;
  appearance?: 'locked' | 'abs' | 'skip' | 'gap';
  marks?: QuantityInput[];
  distanceRule?: 'average' | 'longest' | 'shortest' | 'spread';
  segments: SegmentInput[];
  end?: EndInput;
}

export interface YawInput {
  id: string;
  kind: 'yaw';
  label?: string;
  chord?: QuantityInput;
  middleOrdinate?: QuantityInput;
  offsets?: { chord: QuantityInput; stations: { at: number; offset: number }[] };
  points?: [number, number][];
  drag: DragInput;
  superelevation?: QuantityInput;
  pathAdjustment?: 'none' | 'half-track';
}

export interface AirborneInput {
  id: string;
  kind: 'airborne';
  label?: string;
  distance: QuantityInput;
  drop: QuantityInput;
  takeoffGrade?: QuantityInput;
}

export type AnalysisInput = SkidInput | YawInput | AirborneInput;

/** A case as the engine reads it. */
export interface CaseInput {
  id: string;
  units: 'imperial' | 'metric';
  vehicle: VehicleInput;
  analyses: AnalysisInput[];
  postedLimit?: QuantityInput;
}
