package dev.dwellwise.cure;

/**
 * The Arrhenius temperature dependence that the equivalent time and the kinetics share:
 * k(T) = A exp(−E/(R T)).
 */
public final class Arrhenius {

    /** Molar gas constant R, J/(mol·K): CODATA 2018, exact as N_A·k in the 2019 SI. */
    public static final double GAS_CONSTANT = 8.314462618;

    private Arrhenius() {
    }

    /** Rate constant k = A exp(−E/(R T)), 1/s, for A in 1/s, E in J/mol and T in kelvin. */
    public static double rateConstant(double preExponentialPerS, double activationEnergyJPerMol, double kelvin) {
        return preExponentialPerS * Math.exp(-activationEnergyJPerMol / (GAS_CONSTANT * kelvin));
    }

    /**
     * Seconds at {@code referenceK} that one second at {@code kelvin} is worth:
     * exp[(E/R)(1/T_ref − 1/T)], the integrand of the equivalent age of ASTM C1074.
     */
    public static double equivalenceFactor(double activationEnergyJPerMol, double referenceK, double kelvin) {
        return Math.exp(activationEnergyJPerMol / GAS_CONSTANT * (1 / referenceK - 1 / kelvin));
    }
}
