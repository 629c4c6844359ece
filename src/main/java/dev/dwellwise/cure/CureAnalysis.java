package dev.dwellwise.cure;

import dev.dwellwise.thermal.DenseHistory;
import java.util.OptionalDouble;

/**
 * The entry point: every figure a {@link CureSpec} asks for, along a computed history at its
 * coldest and its hottest point, over the whole history (every stage included).
 */
public final class CureAnalysis {

    private CureAnalysis() {
    }

    /** The figures at the coldest and the hottest point, with the standard budget per figure. */
    public static CureResult of(CureSpec spec, DenseHistory history) {
        return of(spec, history, CureBudget.standard());
    }

    /** The figures at the coldest and the hottest point, each figure within {@code budget}. */
    public static CureResult of(CureSpec spec, DenseHistory history, CureBudget budget) {
        return new CureResult(along(spec, TemperaturePath.coldestOf(history), budget),
                along(spec, TemperaturePath.hottestOf(history), budget));
    }

    /** The figures along one path, each within {@code budget}. */
    public static CureFigures along(CureSpec spec, TemperaturePath path, CureBudget budget) {
        OptionalDouble timeAbove = spec.timeAbove().map(s -> OptionalDouble.of(
                TimeAbove.seconds(path, s.kelvin(), budget))).orElse(OptionalDouble.empty());
        OptionalDouble equivalent = spec.equivalentTime().map(s -> OptionalDouble.of(
                EquivalentTime.seconds(path, s.referenceK(), s.activationEnergyJPerMol(), budget)))
                .orElse(OptionalDouble.empty());
        OptionalDouble degree = OptionalDouble.empty();
        OptionalDouble glassTransition = OptionalDouble.empty();
        if (spec.kinetics().isPresent()) {
            KineticsSpec kinetics = spec.kinetics().get();
            double alpha = DegreeOfCure.atEnd(path, kinetics.model(), budget);
            degree = OptionalDouble.of(alpha);
            glassTransition = kinetics.glassTransition().map(g -> OptionalDouble.of(g.kelvinAt(alpha)))
                    .orElse(OptionalDouble.empty());
        }
        return new CureFigures(timeAbove, equivalent, degree, glassTransition);
    }
}
