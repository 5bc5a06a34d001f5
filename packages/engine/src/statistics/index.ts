export { quantileSorted } from "./quantile-sorted.js";
export { weightedQuantileSorted, weightedQuantilesSorted } from "./weighted-quantile.js";
export { kishEffectiveSize } from "./kish.js";
export { orderStatisticInterval } from "./order-statistic-interval.js";
export { ranks, spearman } from "./rank.js";
