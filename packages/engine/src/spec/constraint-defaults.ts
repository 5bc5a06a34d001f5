/**
 * Internal variability of a decade's mean global warming against 1850–1900, 1 sd in K, used
 * by default beside an observational constraint's own uncertainty.
 *
 * Source: IPCC AR6 WGI Summary for Policymakers A.1.3 assesses the contribution of internal
 * variability to the 2010–2019 warming relative to 1850–1900 as −0.2 °C to +0.2 °C (likely
 * range). Read here as the 17–83 % range of a normal distribution centred on zero (the usual
 * percentile reading of "likely"), so sd = 0.2 / 0.954 = 0.21 K (rounded). A "likely" range is
 * at least 66 %, so this reading is the wider, more cautious one: it weakens a constraint
 * rather than overstating it.
 */
export const DEFAULT_INTERNAL_VARIABILITY = 0.21;
