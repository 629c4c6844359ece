package dev.dwellwise.report;

import dev.dwellwise.cure.CureBudget;
import dev.dwellwise.cure.CureFigures;
import dev.dwellwise.cure.CureSpec;
import dev.dwellwise.cure.DegreeOfCure;
import dev.dwellwise.cure.HoldEstimate;
import dev.dwellwise.cure.KineticsSpec;
import dev.dwellwise.thermal.StageOutcome;
import dev.dwellwise.thermal.ThermalHistory;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;

/**
 * What to tell the operator when a cure minimum is missed: how much longer to run the hold stage.
 *
 * <p>The <em>hold stage</em> is the one a plant engineer would lengthen: the last stage whose air is
 * above the cure threshold (the time-above temperature, or else the equivalent-time reference
 * temperature), or, when no stage is that hot or the spec names no threshold, the stage where the
 * part peaked. The extra hold is estimated at the <em>hold temperature</em>: the lower of the
 * coldest point's temperature at the end of that stage and the temperature the stage settles the
 * part at. Continuing the stage keeps the part at or above it (a part still heating only gets
 * hotter, one cooling toward the stage's steady temperature never falls below it), and the later
 * stages start no cooler than before, so running the stage that much longer really passes: the
 * estimate errs on the long side, never the short.
 *
 * <p>When the estimate cannot be given, or (for the equivalent time and the degree, which slow down
 * steeply with temperature) exceeds {@link #PRACTICAL_HOLD_SECONDS}, the advice says why: if even a part already at the stage's steady temperature could not make it, the part never
 * gets hot enough at these settings; otherwise the stage ended too early to estimate from.
 */
final class HoldAdvice {

    /** Beyond a day of extra hold, the recipe needs a hotter stage, not a longer one. */
    static final double PRACTICAL_HOLD_SECONDS = 86_400;

    private final CureSpec spec;
    private final CureFigures coldest;
    private final CureBudget budget;
    private final StageOutcome stage;
    private final double holdK;

    HoldAdvice(CureSpec spec, CureFigures coldest, ThermalHistory history, CureBudget budget) {
        this.spec = spec;
        this.coldest = coldest;
        this.budget = budget;
        this.stage = holdStage(spec, history);
        this.holdK = Math.min(stage.end().coldestK(), stage.steadyK());
    }

    /** The hold stage's name, for the over-bake advice. */
    String stageName() {
        return stage.conditions().name();
    }

    String forTimeAbove() {
        double thresholdK = spec.timeAbove().orElseThrow().kelvin();
        // present whenever the hold temperature is at or above the threshold: then the shortfall is the answer
        OptionalDouble seconds = HoldEstimate.of(spec, coldest, holdK, budget).timeAboveSeconds();
        if (seconds.isPresent()) {
            return more(seconds.getAsDouble());
        }
        if (stage.steadyK() < thresholdK) {
            return "the part never gets hot enough for this cure at these settings: '" + stageName()
                    + "' settles it at " + Checks.c(stage.steadyK()) + ", below " + Checks.c(thresholdK)
                    + "; raise the air temperature";
        }
        return tooEarly();
    }

    String forEquivalentTime() {
        return advice(HoldEstimate.of(spec, coldest, holdK, budget).equivalentTimeSeconds(),
                HoldEstimate.of(spec, coldest, stage.steadyK(), budget).equivalentTimeSeconds());
    }

    String forDegree() {
        return advice(HoldEstimate.of(spec, coldest, holdK, budget).degreeSeconds(),
                HoldEstimate.of(spec, coldest, stage.steadyK(), budget).degreeSeconds());
    }

    String forGlassTransition() {
        KineticsSpec kinetics = spec.kinetics().orElseThrow();
        double targetDegree = kinetics.glassTransition().orElseThrow().degreeAt(
                kinetics.glassTransition().orElseThrow().minK().orElseThrow());
        double degree = coldest.degree().orElseThrow();
        return advice(DegreeOfCure.secondsToReach(kinetics.model(), holdK, degree, targetDegree, budget),
                DegreeOfCure.secondsToReach(kinetics.model(), stage.steadyK(), degree, targetDegree, budget));
    }

    /** The advice from the estimate at the hold temperature, and at the steady one (the most the stage can give). */
    private String advice(OptionalDouble atHold, OptionalDouble atSteady) {
        if (practical(atHold)) {
            return more(atHold.getAsDouble());
        }
        if (!practical(atSteady)) {
            return "the part never gets hot enough for this cure at these settings: even at "
                    + Checks.c(stage.steadyK()) + ", where '" + stageName() + "' settles it, the cure would need "
                    + "more than a day of further hold; raise the air temperature";
        }
        return tooEarly();
    }

    private String more(double seconds) {
        // rounded up, and at least a second: a shortfall the rounding of the figure hides still needs a little
        long whole = Math.max(1, (long) Math.ceil(seconds));
        return String.format(Locale.ROOT, "about %d s%s more hold in '%s' (coldest point at %s) would pass", whole,
                readable(whole), stageName(), Checks.c(holdK));
    }

    /** Minutes or hours beside long holds, as an operator sets a dwell. */
    private static String readable(long seconds) {
        if (seconds < 120) {
            return "";
        }
        return seconds < 7200 ? String.format(Locale.ROOT, " (%.1f min)", seconds / 60.0)
                : String.format(Locale.ROOT, " (%.1f h)", seconds / 3600.0);
    }

    private String tooEarly() {
        return "the coldest point ends '" + stageName() + "' at only " + Checks.c(stage.end().coldestK())
                + ", too cool to estimate a further hold from; lengthen '" + stageName() + "' (the part was heading"
                + " for " + Checks.c(stage.steadyK()) + ") or raise its air temperature";
    }

    private static boolean practical(OptionalDouble seconds) {
        return seconds.isPresent() && seconds.getAsDouble() <= PRACTICAL_HOLD_SECONDS;
    }

    private static StageOutcome holdStage(CureSpec spec, ThermalHistory history) {
        OptionalDouble thresholdK = spec.timeAbove().isPresent()
                ? OptionalDouble.of(spec.timeAbove().get().kelvin())
                : spec.equivalentTime().isPresent() ? OptionalDouble.of(spec.equivalentTime().get().referenceK())
                : OptionalDouble.empty();
        List<StageOutcome> stages = history.stages();
        if (thresholdK.isPresent()) {
            for (int i = stages.size() - 1; i >= 0; i--) {
                StageOutcome s = stages.get(i);
                if (Math.max(s.conditions().airStartK(), s.conditions().airEndK()) > thresholdK.getAsDouble()) {
                    return s;
                }
            }
        }
        return history.stageWith(Comparator.comparingDouble(StageOutcome::peakK));
    }
}
