export * from "./ar6-anchors.js";
export * from "./harbourline-pathways.js";
