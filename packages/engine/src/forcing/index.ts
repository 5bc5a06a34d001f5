export { co2ForcingMyhre, ch4ForcingTar, n2oForcingTar, methaneNitrousOverlapTar } from "./myhre-1998.js";
export { co2ForcingEtminan, ch4ForcingEtminan, n2oForcingEtminan } from "./etminan-2016.js";
export { co2SarfAr6, ch4SarfAr6, n2oSarfAr6, co2ErfAr6, ch4ErfAr6, n2oErfAr6, AR6_ADJUSTMENT } from "./ar6.js";
export { AR6_1750_CONCENTRATIONS } from "./reference-concentrations.js";
export { gasForcingSeries, type ForcingExpression, type ForcingGas, type GasConcentrations } from "./gas-forcing.js";
