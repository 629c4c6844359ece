package dev.dwellwise.cure;

/**
 * nth-order cure kinetics: d(alpha)/dt = A exp(−E/(R T)) (1 − alpha)^n (R. B. Prime, "Thermosets",
 * in Turi (ed.), Thermal Characterization of Polymeric Materials, 1997). Isothermally, with k = k(T):
 * 1 − alpha = (1 − alpha0) exp(−k t) for n = 1, and (1 − alpha)^(1−n) = (1 − alpha0)^(1−n) − (1 − n) k t
 * for n ≠ 1, which reaches alpha = 1 in finite time when n &lt; 1.
 *
 * @param preExponentialPerS      A, 1/s
 * @param activationEnergyJPerMol E, J/mol
 * @param order                   n, 0 or more
 * @param initialDegree           alpha at the start, 0..1
 */
public record NthOrderKinetics(double preExponentialPerS, double activationEnergyJPerMol, double order,
                               double initialDegree) implements Kinetics {

    public NthOrderKinetics {
        RateLawInvariants.require(initialDegree, preExponentialPerS, activationEnergyJPerMol, order);
    }

    @Override
    public boolean reachesFullCure() {
        return order < 1;
    }

    @Override
    public double rate(double kelvin, double degree) {
        if (degree >= 1) {
            return 0;
        }
        return Arrhenius.rateConstant(preExponentialPerS, activationEnergyJPerMol, kelvin)
                * Math.pow(1 - degree, order);
    }
}
