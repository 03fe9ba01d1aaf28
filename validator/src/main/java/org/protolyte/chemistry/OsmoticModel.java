package org.protolyte.chemistry;

import java.util.OptionalDouble;

/** The osmolality of a solved solution from its species molalities, and the name of the model that gave it. */
interface OsmoticModel {

    record Osmolality(double value, String model) {
    }

    /**
     * @param m          species molalities, in the problem's order
     * @param particles  Σ m plus free H+ and OH-, mol/kg
     */
    Osmolality osmolality(PreparedProblem p, double[] m, double particles, double ionicStrength);

    /**
     * The particles corrected by the activity model's osmotic coefficient; above its warning limit, where free sodium,
     * potassium and chloride carry at least three quarters of the ionic strength, Pitzer's osmotic coefficient of those
     * ions with the other solutes ideal (which overstates the osmolality by a few per cent where divalent ions carry the
     * rest).
     */
    OsmoticModel SALINE = new OsmoticModel() {
        /** The least share of I that Na+, K+ and Cl- must carry for their Pitzer coefficient to stand for the whole. */
        private static final double SALINE_SHARE = 0.75;

        @Override
        public Osmolality osmolality(PreparedProblem p, double[] m, double particles, double ionicStrength) {
            double ideal = particles + p.activity.osmoticExcess(ionicStrength, p.debyeHuckelA);
            double[] saline = new double[3];      // free Na+, K+, Cl-
            for (int i = 0; i < p.n; i++) {
                int k = p.sp[i].protons() == 0 && p.sp[i].components().size() == 1
                        ? Pitzer.salineIndex(p.sp[i].name()) : -1;
                if (k >= 0) {
                    saline[k] += m[i];
                }
            }
            double strong = saline[0] + saline[1] + saline[2];
            OptionalDouble phi = Pitzer.osmoticCoefficient(saline[0], saline[1], saline[2], p.kelvin);
            if (ionicStrength > p.activity.warnAbove() && 0.5 * strong >= SALINE_SHARE * ionicStrength
                    && phi.isPresent()) {
                return new Osmolality(phi.getAsDouble() * strong + (particles - strong),
                        "Pitzer for Na+, K+ and Cl- (Pitzer and Mayorga 1973), the other solutes ideal");
            }
            return new Osmolality(ideal, p.activity.name());
        }
    };
}
