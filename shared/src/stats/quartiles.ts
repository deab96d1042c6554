import { quantile } from './quantile.js';

export interface Quartiles {
  q1: number;
  median: number;
  q3: number;
}

/** Lower quartile, median and upper quartile by the linear (Hyndman–Fan type 7) method. */
export function quartiles(values: readonly number[]): Quartiles {
  return {
    q1: quantile(values, 0.25),
    median: quantile(values, 0.5),
    q3: quantile(values, 0.75),
  };
}
