/** What each check assumes, in plain words, for its page and its reports. */
export const ASSUMPTIONS: Record<string, string> = {
  drop:
    'Elastic, lossless, quasi-static Hertz impact of a sphere (K. L. Johnson, Contact Mechanics, 1985, §11.4); the fruit lands square ' +
    'on a smooth surface; a struck fruit is held still. Real tissue is viscoelastic and stiffer at impact rates, so the elastic peak ' +
    'pressure is an upper bound and the published drop threshold is the figure to trust.',
  stack:
    "Janssen's wall-friction law (1895) with a constant lateral pressure ratio; the bottom layer stacked simple cubic, one contact " +
    'carrying the pressure over one fruit’s square (the harsher case); Hertz between two like spheres (K. L. Johnson, Contact ' +
    'Mechanics, 1985, ch. 4); static and elastic, no creep in storage and no transport vibration.',
  squeeze:
    'Linear elastic, static, Coulomb friction at the pads; axisymmetric fruit squeezed on its axis by two opposed pads. A held grip ' +
    "loses force as the flesh relaxes: with a published Peleg relaxation pair for the fruit the check follows it (Lee & Radok's " +
    'correspondence for a held displacement); without one it assumes none and says so. Twist from an off-centre grip uses the ' +
    "contacts' full-slip torsional friction (Lubkin 1951) and an elliptic force–torque limit.",
};
