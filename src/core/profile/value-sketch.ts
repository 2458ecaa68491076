// What a column keeps of its typed values once it has more of them than are kept exactly
// (ProfileOptions.exactValuesLimit): no row-indexed array, but rank sketches for quantiles and
// histogram counts, and one-pass moments for count, sum, mean, spread, shape, min and max.
import { KIND_DATE, KIND_DATETIME, KIND_DECIMAL, KIND_INTEGER } from '../infer/classify-cell';
import { Moments, type MomentsState } from '../stats/moments';
import { RankSketch, SKETCH_CAPACITY, type RankSketchParts } from '../stats/rank-sketch';

/** A sketch's capacity for a column limit: about a sixteenth of the limit (a power of two, 16 to 65 536). */
export function sketchCapacity(exactValuesLimit: number): number {
  let k = 16;
  while (k * 2 <= SKETCH_CAPACITY && k * 2 * 16 <= exactValuesLimit) k *= 2;
  return k;
}

export interface ValueSketchParts {
  numbers: RankSketchParts;
  numberMoments: MomentsState;
  logs: MomentsState;
  nonPositive: number;
  instants: RankSketchParts;
  instantMoments: MomentsState;
  unsketched: number;
}

/**
 * The sketched values of one column: numbers (integer and decimal cells) and instants (ISO dates
 * and date-times, as milliseconds) apart, as the exact path keeps them apart by type.
 */
export class ValueSketch {
  numbers: RankSketch;
  numberMoments = new Moments();
  /** Moments of ln x over the positive numbers: the geometric mean is exp of their mean. */
  logs = new Moments();
  /** Numbers ≤ 0 (then there is no geometric mean). */
  nonPositive = 0;
  instants: RankSketch;
  instantMoments = new Moments();
  /**
   * Cells with a value the sketch could not take as it is: slash dates, whose reading (day or
   * month first) is known only when the column is assembled, and any other kind.
   */
  unsketched = 0;

  constructor(capacity: number) {
    this.numbers = new RankSketch(capacity);
    this.instants = new RankSketch(capacity);
  }

  /** Adds a cell's value by its kind (KIND_MASK applied). */
  add(kind: number, value: number): void {
    if (kind === KIND_INTEGER || kind === KIND_DECIMAL) {
      this.numbers.add(value);
      this.numberMoments.push(value);
      if (value > 0) this.logs.push(Math.log(value));
      else this.nonPositive++;
    } else if (kind === KIND_DATE || kind === KIND_DATETIME) {
      this.instants.add(value);
      this.instantMoments.push(value);
    } else this.unsketched++;
  }

  /** Merges the sketch of the rows right after this one's. */
  merge(other: ValueSketch): void {
    this.numbers.merge(other.numbers);
    this.numberMoments = Moments.merge(this.numberMoments, other.numberMoments);
    this.logs = Moments.merge(this.logs, other.logs);
    this.nonPositive += other.nonPositive;
    this.instants.merge(other.instants);
    this.instantMoments = Moments.merge(this.instantMoments, other.instantMoments);
    this.unsketched += other.unsketched;
  }

  get heldBytes(): number {
    return this.numbers.heldBytes + this.instants.heldBytes;
  }

  toParts(): ValueSketchParts {
    return {
      numbers: this.numbers.toParts(), numberMoments: this.numberMoments.toJSON(), logs: this.logs.toJSON(), nonPositive: this.nonPositive,
      instants: this.instants.toParts(), instantMoments: this.instantMoments.toJSON(), unsketched: this.unsketched,
    };
  }

  static fromParts(p: ValueSketchParts): ValueSketch {
    const s = new ValueSketch(p.numbers.capacity);
    s.numbers = RankSketch.fromParts(p.numbers);
    s.numberMoments = Moments.fromJSON(p.numberMoments);
    s.logs = Moments.fromJSON(p.logs);
    s.nonPositive = p.nonPositive;
    s.instants = RankSketch.fromParts(p.instants);
    s.instantMoments = Moments.fromJSON(p.instantMoments);
    s.unsketched = p.unsketched;
    return s;
  }
}
