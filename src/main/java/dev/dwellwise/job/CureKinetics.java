package dev.dwellwise.job;

import com.fasterxml.jackson.annotation.JsonSubTypes;
import com.fasterxml.jackson.annotation.JsonTypeInfo;

/**
 * A cure rate law as the job writes it, told apart by {@code model}: {@code nth-order} or
 * {@code kamal-sourour}. The degree of cure is integrated along the coldest and the hottest point's
 * history and must reach {@code minDegree} at the coldest point.
 */
@JsonTypeInfo(use = JsonTypeInfo.Id.NAME, property = "model")
@JsonSubTypes({
        @JsonSubTypes.Type(value = CureKinetics.NthOrder.class, name = "nth-order"),
        @JsonSubTypes.Type(value = CureKinetics.KamalSourour.class, name = "kamal-sourour")})
public sealed interface CureKinetics {

    /** The degree of cure assumed when the job gives no {@code initialDegree}: an uncured coating. */
    double DEFAULT_INITIAL_DEGREE = 0;

    /** Least degree of cure at the end of the history, 0..1. */
    Double minDegree();

    /** Degree of cure at the start, 0..1 (default 0). */
    Double initialDegree();

    /** The glass transition that follows from the degree (optional). */
    GlassTransition glassTransition();

    CureKinetics withDefaults();

    /**
     * d(alpha)/dt = A exp(−E/RT) (1 − alpha)^n.
     *
     * @param preExponentialPerS       A, 1/s
     * @param activationEnergyKJPerMol E, kJ/mol
     * @param order                    n
     */
    record NthOrder(Double preExponentialPerS, Double activationEnergyKJPerMol, Double order, Double minDegree,
                    Double initialDegree, GlassTransition glassTransition) implements CureKinetics {

        @Override
        public NthOrder withDefaults() {
            return new NthOrder(preExponentialPerS, activationEnergyKJPerMol, order, minDegree,
                    initialDegree == null ? DEFAULT_INITIAL_DEGREE : initialDegree, glassTransition);
        }
    }

    /**
     * Autocatalytic: d(alpha)/dt = (k1 + k2 alpha^m)(1 − alpha)^n, k_i = A_i exp(−E_i/RT).
     *
     * @param k1PreExponentialPerS       A1, 1/s
     * @param k1ActivationEnergyKJPerMol E1, kJ/mol
     * @param k2PreExponentialPerS       A2, 1/s
     * @param k2ActivationEnergyKJPerMol E2, kJ/mol
     * @param m                          the autocatalytic exponent
     * @param n                          the reaction order
     */
    record KamalSourour(Double k1PreExponentialPerS, Double k1ActivationEnergyKJPerMol, Double k2PreExponentialPerS,
                        Double k2ActivationEnergyKJPerMol, Double m, Double n, Double minDegree,
                        Double initialDegree, GlassTransition glassTransition) implements CureKinetics {

        @Override
        public KamalSourour withDefaults() {
            return new KamalSourour(k1PreExponentialPerS, k1ActivationEnergyKJPerMol, k2PreExponentialPerS,
                    k2ActivationEnergyKJPerMol, m, n, minDegree,
                    initialDegree == null ? DEFAULT_INITIAL_DEGREE : initialDegree, glassTransition);
        }
    }

    /**
     * The glass transition by DiBenedetto, (Tg − Tg0)/(Tg∞ − Tg0) = λ alpha / [1 − (1 − λ) alpha].
     *
     * @param tg0C    Tg of the uncured resin, °C
     * @param tgFullC Tg of the fully cured network, °C
     * @param lambda  λ = ΔCp∞/ΔCp0, in (0, 1]
     * @param minC    the least Tg the coating must reach at the coldest point, °C (optional)
     */
    record GlassTransition(Double tg0C, Double tgFullC, Double lambda, Double minC) {
    }
}
