// One home for the inputs' plain names, shared with the PDF report (contracts).
export { CLIMATE_INPUT_LABELS, CLIMATE_INPUT_SHORT, inputLabel, SCALE_FACTOR_UNIT, inputUnit } from "@plumeline/contracts";
