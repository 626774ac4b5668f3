/**
 * The caution that goes with every result, in one wording for the app, the command line, the
 * exports and the README (a test checks the README carries the same words).
 */
export const CAUTION =
  "Switch-level estimates, not sign-off: confirm with circuit simulation and the foundry's rules.";
