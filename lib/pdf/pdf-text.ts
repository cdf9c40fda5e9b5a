/** Fixed wording of the memo PDF. */

export const CAUTION_TITLE = 'Caution';
export const CAUTION_TEXT =
  'The results in this memo come from preliminary-design models: zonal secular theory with first-order short-period terms, tabulated atmospheres and a conical Earth shadow of a spherical Earth. ' +
  'Verify every result with high-fidelity tools before it is used. The programme’s approved procedures and licensed engineering practice govern.';

/** Printed when no issuing organisation was set (lib/organisation): visibly a gap, never a guessed name. */
export const UNSET_ORGANISATION = 'Issuing organisation not set';

export const DEFAULT_DISTRIBUTION =
  'Distribution: the issuing organisation and the addressed customer only. Do not pass on without written consent.';

export const DRAFT_BAND = 'DRAFT — not a frozen revision; numbers are recomputed at every render';

export const DOCUMENT_KIND = 'Orbit design memo';
