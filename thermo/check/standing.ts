/** The caution every result carries, whatever the figures show. */
export const STANDING_CAUTION =
  'These figures come from a model and the entered readings. They support, and never replace, ' +
  'the site procedures, the applicable code and the judgement of a licensed, trained person. ' +
  'They do not say that filling, withdrawing or leaving the tank as it is is safe.';
