import type { AnalysisOptions } from "@/features/editor/hooks/useLiveDiagram";

/**
 * How a saved version is analysed away from the editor (the compare page, the review sheet): the default pair,
 * the default break, nominal parameter values and a 2 % settling band — the settings a new editor session starts with.
 */
export const SAVED_VERSION_ANALYSIS: AnalysisOptions = {
  input: null,
  output: null,
  break: null,
  values: {},
  band: 0.02,
  sweepParameter: null,
  sweepShown: false,
  sweepNegative: false,
};
