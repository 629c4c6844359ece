package dev.dwellwise.job;

import dev.dwellwise.cure.CureSpec;
import dev.dwellwise.cure.EquivalentTimeSpec;
import dev.dwellwise.cure.GlassTransitionSpec;
import dev.dwellwise.cure.KamalSourourKinetics;
import dev.dwellwise.cure.Kinetics;
import dev.dwellwise.cure.KineticsSpec;
import dev.dwellwise.cure.NthOrderKinetics;
import dev.dwellwise.cure.TimeAboveSpec;
import dev.dwellwise.thermal.Physics;
import java.util.Optional;
import java.util.OptionalDouble;

/** Turns a validated cure (defaults filled) into the cure package's spec: kelvin, J/mol, seconds. */
public final class CureSpecBuilder {

    private static final double JOULES_PER_KILOJOULE = 1000;

    private CureSpecBuilder() {
    }

    public static CureSpec build(Cure cure) {
        return new CureSpec(Optional.ofNullable(cure.timeAbove()).map(CureSpecBuilder::timeAbove),
                Optional.ofNullable(cure.equivalentTime()).map(CureSpecBuilder::equivalentTime),
                Optional.ofNullable(cure.kinetics()).map(CureSpecBuilder::kinetics));
    }

    private static TimeAboveSpec timeAbove(Cure.TimeAbove t) {
        return new TimeAboveSpec(Physics.toKelvin(t.temperatureC()), t.minSeconds(), optional(t.maxSeconds()));
    }

    private static EquivalentTimeSpec equivalentTime(Cure.EquivalentTime e) {
        return new EquivalentTimeSpec(Physics.toKelvin(e.referenceC()), joules(e.activationEnergyKJPerMol()),
                e.minSeconds(), optional(e.maxSeconds()));
    }

    private static KineticsSpec kinetics(CureKinetics k) {
        return new KineticsSpec(rateLaw(k), k.minDegree(),
                Optional.ofNullable(k.glassTransition()).map(CureSpecBuilder::glassTransition));
    }

    /** The rate law alone; also what the validator asks whether full cure can be reached. */
    static Kinetics rateLaw(CureKinetics k) {
        double initial = k.initialDegree() == null ? CureKinetics.DEFAULT_INITIAL_DEGREE : k.initialDegree();
        if (k instanceof CureKinetics.NthOrder n) {
            return new NthOrderKinetics(n.preExponentialPerS(), joules(n.activationEnergyKJPerMol()), n.order(),
                    initial);
        }
        CureKinetics.KamalSourour ks = (CureKinetics.KamalSourour) k;
        return new KamalSourourKinetics(ks.k1PreExponentialPerS(), joules(ks.k1ActivationEnergyKJPerMol()),
                ks.k2PreExponentialPerS(), joules(ks.k2ActivationEnergyKJPerMol()), ks.m(), ks.n(), initial);
    }

    private static GlassTransitionSpec glassTransition(CureKinetics.GlassTransition g) {
        return new GlassTransitionSpec(Physics.toKelvin(g.tg0C()), Physics.toKelvin(g.tgFullC()), g.lambda(),
                g.minC() == null ? OptionalDouble.empty() : OptionalDouble.of(Physics.toKelvin(g.minC())));
    }

    private static double joules(double kiloJoules) {
        return kiloJoules * JOULES_PER_KILOJOULE;
    }

    private static OptionalDouble optional(Double value) {
        return value == null ? OptionalDouble.empty() : OptionalDouble.of(value);
    }
}
