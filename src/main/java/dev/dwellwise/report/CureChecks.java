package dev.dwellwise.report;

import dev.dwellwise.cure.CureSpec;
import dev.dwellwise.cure.EquivalentTimeSpec;
import dev.dwellwise.cure.GlassTransitionSpec;
import dev.dwellwise.cure.KineticsSpec;
import dev.dwellwise.cure.TimeAboveSpec;
import dev.dwellwise.thermal.DecimalText;
import dev.dwellwise.thermal.Physics;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Supplier;

/**
 * The cure checks: {@code cure-time-above}, {@code cure-equivalent-time}, {@code cure-degree} and
 * {@code cure-glass-transition}, one for each part of the spec that is given. A minimum is judged
 * at the coldest point (under-cure), a maximum at the hottest (over-bake, the far side of the cure
 * window). A check's {@code value} and {@code limit} are the minimum's, unless the minimum is met
 * and the maximum is not; its sentence covers both. A missed minimum comes with the extra hold that
 * would meet it ({@link HoldAdvice}).
 *
 * <p>Each is judged on the figure as reported (rounded as in {@link CureReport}), so the value in
 * the answer and the verdict always agree.
 */
final class CureChecks {

    static final String TIME_ABOVE = "cure-time-above";
    static final String EQUIVALENT_TIME = "cure-equivalent-time";
    static final String DEGREE = "cure-degree";
    static final String GLASS_TRANSITION = "cure-glass-transition";

    private CureChecks() {
    }

    static List<CheckResult> of(CureSpec spec, CureReport figures, HoldAdvice hold) {
        List<CheckResult> checks = new ArrayList<>();
        spec.timeAbove().ifPresent(s -> checks.add(timeAbove(s, figures, hold)));
        spec.equivalentTime().ifPresent(s -> checks.add(equivalentTime(s, figures, hold)));
        spec.kinetics().ifPresent(s -> checks.add(degree(s, figures, hold)));
        spec.kinetics().flatMap(KineticsSpec::glassTransition).filter(g -> g.minK().isPresent())
                .ifPresent(g -> checks.add(glassTransition(g, figures, hold)));
        return checks;
    }

    private static CheckResult timeAbove(TimeAboveSpec s, CureReport figures, HoldAdvice hold) {
        String above = " at or above " + Checks.c(s.kelvin());
        return window(TIME_ABOVE, new Side(figures.coldest().timeAboveSeconds(), s.minSeconds(),
                        "coldest point spent "),
                s.maxSeconds().isEmpty() ? null : new Side(figures.hottest().timeAboveSeconds(),
                        s.maxSeconds().getAsDouble(), "hottest point spent "),
                above, hold::forTimeAbove, hold);
    }

    private static CheckResult equivalentTime(EquivalentTimeSpec s, CureReport figures, HoldAdvice hold) {
        String worth = " at " + Checks.c(s.referenceK()) + " (E = "
                + DecimalText.trimmed(Rounding.significant(s.activationEnergyJPerMol() / 1000)) + " kJ/mol)";
        return window(EQUIVALENT_TIME, new Side(figures.coldest().equivalentSeconds(), s.minSeconds(),
                        "the coldest point's history is worth "),
                s.maxSeconds().isEmpty() ? null : new Side(figures.hottest().equivalentSeconds(),
                        s.maxSeconds().getAsDouble(), "the hottest point's history is worth "),
                worth, hold::forEquivalentTime, hold);
    }

    private static CheckResult degree(KineticsSpec s, CureReport figures, HoldAdvice hold) {
        double degree = figures.coldest().degree();
        boolean met = degree >= s.minDegree();
        String detail = met
                ? "coldest point reached a degree of cure of " + DecimalText.fixed(degree, 4) + ", at least the required "
                        + DecimalText.trimmed(s.minDegree())
                : "coldest point reached only " + DecimalText.fixed(degree, 4) + " of the required "
                        + DecimalText.trimmed(s.minDegree()) + " degree of cure: under-cured; " + hold.forDegree();
        return new CheckResult(DEGREE, met ? CheckResult.PASS : CheckResult.FAIL, degree, s.minDegree(), detail, null);
    }

    private static CheckResult glassTransition(GlassTransitionSpec g, CureReport figures, HoldAdvice hold) {
        double tgC = figures.coldest().glassTransitionC();
        double minC = Rounding.temperature(Physics.toCelsius(g.minK().getAsDouble()));
        boolean met = tgC >= minC;
        String reached = "coldest point's glass transition reached " + Checks.c1(tgC) + " (degree of cure "
                + DecimalText.fixed(figures.coldest().degree(), 4) + ")";
        String detail = met
                ? reached + ", at least the required " + Checks.c1(minC)
                : reached + ", below the required " + Checks.c1(minC) + ": under-cured; " + hold.forGlassTransition();
        return new CheckResult(GLASS_TRANSITION, met ? CheckResult.PASS : CheckResult.FAIL, tgC, minC, detail, null);
    }

    /** One end of a cure window: the figure at its point, the bound, and how a sentence about it begins. */
    private record Side(double value, double bound, String opening) {

        String describe(String what) {
            return opening + Checks.s(value) + what;
        }
    }

    /**
     * A check of seconds with a minimum at the coldest point and an optional maximum at the
     * hottest. The sentence speaks of what failed, with the advice for it, or of both ends when
     * both pass; {@code value} and {@code limit} are the minimum's unless only the maximum failed.
     */
    private static CheckResult window(String name, Side min, Side max, String what, Supplier<String> holdAdvice,
                                      HoldAdvice hold) {
        boolean underCured = min.value() < min.bound();
        boolean overBaked = max != null && max.value() > max.bound();
        String detail;
        if (underCured && overBaked) {
            detail = min.describe(what) + ", short of the required " + Checks.s(min.bound()) + ", and "
                    + max.describe(what) + ", over the cure window's " + Checks.s(max.bound())
                    + ": the part heats too unevenly for this cure window at these settings; a longer stage at a lower "
                    + "air temperature evens it out";
        } else if (underCured) {
            detail = min.describe(what) + ", short of the required " + Checks.s(min.bound()) + ": under-cured; "
                    + holdAdvice.get();
        } else if (overBaked) {
            detail = max.describe(what) + ", over the cure window's " + Checks.s(max.bound()) + ": over-bake risk; "
                    + "shorten the hold in '" + hold.stageName() + "' or lower its air temperature";
        } else {
            detail = min.describe(what) + ", at least the required " + Checks.s(min.bound())
                    + (max == null ? "" : "; " + max.describe("") + ", within the cure window's " + Checks.s(max.bound()));
        }
        Side decisive = overBaked && !underCured ? max : min;
        return new CheckResult(name, underCured || overBaked ? CheckResult.FAIL : CheckResult.PASS, decisive.value(),
                decisive.bound(), detail, null);
    }
}
