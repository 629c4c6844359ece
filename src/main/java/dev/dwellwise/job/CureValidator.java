package dev.dwellwise.job;

import java.util.List;

/**
 * Checks the {@code cure} of a job and names each offending field by its path
 * ({@code cure.kinetics.order}); part of {@link JobValidator}, adding to its list of errors.
 */
final class CureValidator extends FieldChecks {

    /** Far above published cure kinetics (ln A near 25 per second for an epoxy-anhydride); bounds the stiffness. */
    private static final double MAX_PRE_EXPONENTIAL = 1e30;
    /** Far above published thermoset activation energies (about 40 to 150 kJ/mol). */
    private static final double MAX_ACTIVATION_KJ_PER_MOL = 1000;

    private static final String NEVER_FULL_CURE = "cannot be met: with a reaction order of 1 or more the rate law "
            + "only approaches full cure and never reaches it; ";

    CureValidator(List<FieldError> errors) {
        super(errors);
    }

    void cure(Cure cure, String p) {
        if (cure.timeAbove() == null && cure.equivalentTime() == null && cure.kinetics() == null) {
            add(p, "give at least one of timeAbove, equivalentTime, kinetics");
        }
        if (cure.timeAbove() != null) {
            timeAbove(cure.timeAbove(), p + ".timeAbove");
        }
        if (cure.equivalentTime() != null) {
            equivalentTime(cure.equivalentTime(), p + ".equivalentTime");
        }
        if (cure.kinetics() != null) {
            kinetics(cure.kinetics(), p + ".kinetics");
        }
    }

    private void timeAbove(Cure.TimeAbove t, String p) {
        if (required(t.temperatureC(), p + ".temperatureC")) {
            temperature(t.temperatureC(), p + ".temperatureC");
        }
        window(t.minSeconds(), t.maxSeconds(), p);
    }

    private void equivalentTime(Cure.EquivalentTime e, String p) {
        if (required(e.referenceC(), p + ".referenceC")) {
            temperature(e.referenceC(), p + ".referenceC");
        }
        activationEnergy(e.activationEnergyKJPerMol(), p + ".activationEnergyKJPerMol");
        window(e.minSeconds(), e.maxSeconds(), p);
    }

    /** A required minimum and an optional maximum of seconds, the maximum not below the minimum. */
    private void window(Double min, Double max, String p) {
        boolean minSound = required(min, p + ".minSeconds") && seconds(min, p + ".minSeconds");
        if (max != null && seconds(max, p + ".maxSeconds") && minSound && max < min) {
            add(p + ".maxSeconds", "is below minSeconds: the cure window would be empty");
        }
    }

    private boolean seconds(double value, String field) {
        if (!finite(value, field)) {
            return false;
        }
        if (value < 0) {
            add(field, "must be 0 or more seconds");
            return false;
        }
        return true;
    }

    private void kinetics(CureKinetics k, String p) {
        boolean sound; // '&', not '&&': every parameter is checked, so all errors come back at once
        if (k instanceof CureKinetics.NthOrder n) {
            sound = preExponential(n.preExponentialPerS(), p + ".preExponentialPerS")
                    & activationEnergy(n.activationEnergyKJPerMol(), p + ".activationEnergyKJPerMol")
                    & exponent(n.order(), p + ".order");
        } else {
            CureKinetics.KamalSourour ks = (CureKinetics.KamalSourour) k;
            sound = preExponential(ks.k1PreExponentialPerS(), p + ".k1PreExponentialPerS")
                    & activationEnergy(ks.k1ActivationEnergyKJPerMol(), p + ".k1ActivationEnergyKJPerMol")
                    & preExponential(ks.k2PreExponentialPerS(), p + ".k2PreExponentialPerS")
                    & activationEnergy(ks.k2ActivationEnergyKJPerMol(), p + ".k2ActivationEnergyKJPerMol")
                    & exponent(ks.m(), p + ".m")
                    & exponent(ks.n(), p + ".n");
        }
        boolean degreesSound = required(k.minDegree(), p + ".minDegree")
                && range(k.minDegree(), 0, 1, p + ".minDegree");
        if (k.initialDegree() != null) {
            degreesSound &= range(k.initialDegree(), 0, 1, p + ".initialDegree");
        }
        // Whether alpha = 1 can be reached is the rate law's to say, once its parameters are sound.
        boolean fullCureReachable = !(sound && degreesSound) || CureSpecBuilder.rateLaw(k).reachesFullCure();
        if (degreesSound && k.minDegree() == 1 && !fullCureReachable) {
            add(p + ".minDegree", NEVER_FULL_CURE + "ask for a degree below 1, such as 0.99");
        }
        if (k.glassTransition() != null) {
            glassTransition(k.glassTransition(), p + ".glassTransition", fullCureReachable);
        }
    }

    private void glassTransition(CureKinetics.GlassTransition g, String p, boolean fullCureReachable) {
        boolean tg0 = required(g.tg0C(), p + ".tg0C") && temperature(g.tg0C(), p + ".tg0C");
        boolean tgFull = required(g.tgFullC(), p + ".tgFullC") && temperature(g.tgFullC(), p + ".tgFullC");
        if (tg0 && tgFull && !(g.tgFullC() > g.tg0C())) {
            add(p + ".tgFullC", "must be above tg0C: the glass transition rises as the network cures");
            tgFull = false;
        }
        if (required(g.lambda(), p + ".lambda") && finite(g.lambda(), p + ".lambda")
                && !(g.lambda() > 0 && g.lambda() <= 1)) {
            add(p + ".lambda", "must be above 0 and at most 1 (the ratio of the heat capacity steps, cured to uncured)");
        }
        if (g.minC() != null && temperature(g.minC(), p + ".minC") && tgFull) {
            if (g.minC() > g.tgFullC()) {
                add(p + ".minC", "is above tgFullC, the glass transition of the fully cured network, which it "
                        + "never exceeds");
            } else if (g.minC().equals(g.tgFullC()) && !fullCureReachable) {
                add(p + ".minC", NEVER_FULL_CURE + "ask for a glass transition below tgFullC");
            }
        }
    }

    private boolean preExponential(Double value, String field) {
        if (!required(value, field) || !finite(value, field)) {
            return false;
        }
        if (!(value > 0)) {
            add(field, "must be above 0 (a rate constant of 0 never cures)");
            return false;
        }
        if (value > MAX_PRE_EXPONENTIAL) {
            add(field, "must be at most 1e30 per second: beyond any published cure kinetics, and too stiff to "
                    + "integrate within the compute budget");
            return false;
        }
        return true;
    }

    private boolean activationEnergy(Double value, String field) {
        if (!required(value, field) || !finite(value, field)) {
            return false;
        }
        if (value < 0) {
            add(field, "must be 0 or more kJ/mol: a negative activation energy would cure faster when colder");
            return false;
        }
        if (value > MAX_ACTIVATION_KJ_PER_MOL) {
            add(field, "must be at most 1000 kJ/mol: beyond any published cure kinetics (thermosets lie near "
                    + "40 to 150 kJ/mol)");
            return false;
        }
        return true;
    }

    private boolean exponent(Double value, String field) {
        if (!required(value, field) || !finite(value, field)) {
            return false;
        }
        if (value < 0) {
            add(field, "must be 0 or more");
            return false;
        }
        return true;
    }
}
