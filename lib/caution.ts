/** The caution shown on every result, report and screen footer (product.md, "Cautions"). */
export const CODE_EDITION = "ACI 318-19";
export const CAUTION =
  "Caryatid supports, and never replaces, the judgement of a licensed engineer. Local building codes and the engineer of record govern. Checks follow " +
  CODE_EDITION +
  "; every result states the assumptions (EI option, k, braced or sway, βdns) that produced it.";
