/** The standing caution of the product, shown wherever a result is shown and in the footer. */
export const STANDING_CAUTION =
  'Estimates are screening figures from linear-elastic models and published averages, not a substitute ' +
  'for bruise tests on the actual fruit, line and season; values vary with cultivar, maturity, ' +
  'temperature and storage.';

export const MACHINERY_CAUTION =
  "Machinery work follows the site's guarding and lock-out rules and local codes; robot cells near " +
  'people follow ISO 10218 and ISO/TS 15066. Defer to lab tests and licensed practice.';
