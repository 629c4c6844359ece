package dev.dwellwise.cure;

/**
 * Kamal–Sourour autocatalytic cure kinetics: d(alpha)/dt = (k1 + k2 alpha^m)(1 − alpha)^n with
 * k_i = A_i exp(−E_i/(R T)) (Sourour and Kamal, Thermochimica Acta 14 (1976) 41–59).
 *
 * <p>With k1 = 0 the rate vanishes at alpha = 0: a history that starts from
 * {@code initialDegree} 0 then stays at 0. Seeding it (say 1e-6) is the caller's choice, not made here.
 *
 * @param k1PreExponentialPerS      A1, 1/s
 * @param k1ActivationEnergyJPerMol E1, J/mol
 * @param k2PreExponentialPerS      A2, 1/s
 * @param k2ActivationEnergyJPerMol E2, J/mol
 * @param m                         the autocatalytic exponent, 0 or more
 * @param n                         the reaction order, 0 or more
 * @param initialDegree             alpha at the start, 0..1
 */
public record KamalSourourKinetics(double k1PreExponentialPerS, double k1ActivationEnergyJPerMol,
                                   double k2PreExponentialPerS, double k2ActivationEnergyJPerMol,
                                   double m, double n, double initialDegree) implements Kinetics {

    public KamalSourourKinetics {
        RateLawInvariants.require(initialDegree, k1PreExponentialPerS, k1ActivationEnergyJPerMol,
                k2PreExponentialPerS, k2ActivationEnergyJPerMol, m, n);
    }

    @Override
    public boolean reachesFullCure() {
        return n < 1;
    }

    @Override
    public double rate(double kelvin, double degree) {
        if (degree >= 1) {
            return 0;
        }
        // an integrator's trial state may dip a rounding error below 0, where alpha^m has no real value
        double alpha = Math.max(0, degree);
        double k1 = Arrhenius.rateConstant(k1PreExponentialPerS, k1ActivationEnergyJPerMol, kelvin);
        double k2 = Arrhenius.rateConstant(k2PreExponentialPerS, k2ActivationEnergyJPerMol, kelvin);
        return (k1 + k2 * Math.pow(alpha, m)) * Math.pow(1 - alpha, n);
    }
}
