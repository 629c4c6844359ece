package dev.dwellwise.cure;

import java.util.Objects;
import java.util.OptionalDouble;

/**
 * How many more seconds at a constant hold temperature would bring each cure figure to its
 * minimum, for a sentence to the operator ("hold 4 more minutes at 185 °C"). The part is taken to
 * be at the hold temperature from now on (the time to get there is not counted). Each is 0 when
 * the figure already meets its minimum, and empty when the spec does not ask for it or it cannot
 * be estimated.
 *
 * @param equivalentTimeSeconds to reach the equivalent-time minimum
 * @param degreeSeconds         to reach the minimum degree of cure
 * @param timeAboveSeconds      to reach the time-above minimum
 */
public record HoldEstimate(OptionalDouble equivalentTimeSeconds, OptionalDouble degreeSeconds,
                           OptionalDouble timeAboveSeconds) {

    public HoldEstimate {
        Objects.requireNonNull(equivalentTimeSeconds, "equivalentTimeSeconds");
        Objects.requireNonNull(degreeSeconds, "degreeSeconds");
        Objects.requireNonNull(timeAboveSeconds, "timeAboveSeconds");
    }

    /**
     * The estimate from {@code figures} (normally the coldest point's) for a hold at {@code holdK}:
     * <ul>
     * <li>equivalent time: (t_eq,min − t_eq) / exp[(E/R)(1/T_ref − 1/T_hold)];</li>
     * <li>degree: the kinetics integrated isothermally at T_hold from the current degree until
     * the minimum (empty if not reached within {@link DegreeOfCure#HOLD_HORIZON_SECONDS});</li>
     * <li>time above: t_min − t, empty when T_hold is below the time-above temperature.</li>
     * </ul>
     */
    public static HoldEstimate of(CureSpec spec, CureFigures figures, double holdK, CureBudget budget) {
        return new HoldEstimate(forEquivalentTime(spec, figures, holdK), forDegree(spec, figures, holdK, budget),
                forTimeAbove(spec, figures, holdK));
    }

    private static OptionalDouble forEquivalentTime(CureSpec spec, CureFigures figures, double holdK) {
        if (spec.equivalentTime().isEmpty() || figures.equivalentSeconds().isEmpty()) {
            return OptionalDouble.empty();
        }
        EquivalentTimeSpec s = spec.equivalentTime().get();
        double missing = s.minSeconds() - figures.equivalentSeconds().getAsDouble();
        if (missing <= 0) {
            return OptionalDouble.of(0);
        }
        double factor = Arrhenius.equivalenceFactor(s.activationEnergyJPerMol(), s.referenceK(), holdK);
        // a factor that underflows to 0 (a hold far below T_ref) would take forever
        return factor > 0 ? OptionalDouble.of(missing / factor) : OptionalDouble.empty();
    }

    private static OptionalDouble forDegree(CureSpec spec, CureFigures figures, double holdK, CureBudget budget) {
        if (spec.kinetics().isEmpty() || figures.degree().isEmpty()) {
            return OptionalDouble.empty();
        }
        KineticsSpec s = spec.kinetics().get();
        return DegreeOfCure.secondsToReach(s.model(), holdK, figures.degree().getAsDouble(), s.minDegree(), budget);
    }

    private static OptionalDouble forTimeAbove(CureSpec spec, CureFigures figures, double holdK) {
        if (spec.timeAbove().isEmpty() || figures.timeAboveSeconds().isEmpty()) {
            return OptionalDouble.empty();
        }
        TimeAboveSpec s = spec.timeAbove().get();
        double missing = s.minSeconds() - figures.timeAboveSeconds().getAsDouble();
        if (missing <= 0) {
            return OptionalDouble.of(0);
        }
        return holdK >= s.kelvin() ? OptionalDouble.of(missing) : OptionalDouble.empty();
    }
}
