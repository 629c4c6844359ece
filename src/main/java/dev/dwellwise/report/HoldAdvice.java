package dev.dwellwise.report;

import dev.dwellwise.cure.CureAnalysis;
import dev.dwellwise.cure.CureBudget;
import dev.dwellwise.cure.CureFigures;
import dev.dwellwise.cure.CureSpec;
import dev.dwellwise.cure.DegreeOfCure;
import dev.dwellwise.cure.HoldEstimate;
import dev.dwellwise.cure.KineticsSpec;
import dev.dwellwise.cure.TemperaturePath;
import dev.dwellwise.thermal.DecimalText;
import dev.dwellwise.thermal.DenseHistory;
import dev.dwellwise.thermal.EndCondition;
import dev.dwellwise.thermal.StageOutcome;
import dev.dwellwise.thermal.ThermalHistory;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.OptionalDouble;

/**
 * What to tell the operator when a cure minimum is missed: how much longer to run the hold stage.
 *
 * <p>The <em>hold stage</em> is the one a plant engineer would lengthen: the last stage whose air is
 * above the cure threshold (the time-above temperature, or else the equivalent-time reference
 * temperature), or, when no stage is that hot or the spec names no threshold, the stage where the
 * part peaked. The extra hold is estimated at the <em>hold temperature</em>: the lower of the
 * coldest point's temperature at the end of that stage and the temperature the stage settles the
 * part at, so that the part stays at or above it while the stage goes on (a part still heating only
 * gets hotter, one cooling toward the stage's steady temperature never falls below it).
 *
 * <p>What the extra hold must make up depends on what the later stages do with a longer hold. If
 * the part is still heating when the stage ends and every later stage ends after a fixed time or
 * on cooling, the later stages start at least as hot as before and give at least as much: the
 * shortfall over the whole history is what is missing. Otherwise (the part settles cooler, or a
 * later stage would end sooner on a hotter part) the later stages are not counted on, and the
 * shortfall is taken at the end of the hold stage. Either way the estimate errs long, never short.
 *
 * <p>When the estimate cannot be given, or (for the equivalent time and the degree, which slow down
 * steeply with temperature) exceeds {@link #PRACTICAL_HOLD_SECONDS}, the advice says why: if even a
 * part already at the stage's steady temperature could not make it, the part never gets hot enough
 * at these settings; otherwise the stage ended too early to estimate from.
 */
final class HoldAdvice {

    /** Beyond a day of extra hold, the recipe needs a hotter stage, not a longer one. */
    static final double PRACTICAL_HOLD_SECONDS = 86_400;

    private final CureSpec spec;
    private final CureFigures wholeHistory;
    private final ThermalHistory history;
    private final CureBudget budget;
    private final StageOutcome stage;
    private final double holdK;
    /** The figures the shortfall is measured from; computed once, and only when a minimum is missed. */
    private CureFigures basis;

    HoldAdvice(CureSpec spec, CureFigures coldest, ThermalHistory history, CureBudget budget) {
        this.spec = spec;
        this.wholeHistory = coldest;
        this.history = history;
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
        OptionalDouble seconds = HoldEstimate.of(spec, basis(), holdK, budget).timeAboveSeconds();
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
        return advice(HoldEstimate.of(spec, basis(), holdK, budget).equivalentTimeSeconds(),
                HoldEstimate.of(spec, basis(), stage.steadyK(), budget).equivalentTimeSeconds());
    }

    String forDegree() {
        return advice(HoldEstimate.of(spec, basis(), holdK, budget).degreeSeconds(),
                HoldEstimate.of(spec, basis(), stage.steadyK(), budget).degreeSeconds());
    }

    String forGlassTransition() {
        KineticsSpec kinetics = spec.kinetics().orElseThrow();
        double targetDegree = kinetics.glassTransition().orElseThrow().degreeAt(
                kinetics.glassTransition().orElseThrow().minK().orElseThrow());
        double degree = basis().degree().orElseThrow();
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
        return "about " + whole + " s" + readable(whole) + " more hold in '" + stageName()
                + "' (coldest point at or above " + Checks.c(holdK) + ") would pass";
    }

    /** Minutes or hours beside long holds, as an operator sets a dwell. */
    private static String readable(long seconds) {
        if (seconds < 120) {
            return "";
        }
        return seconds < 7200 ? " (" + DecimalText.fixed(seconds / 60.0, 1) + " min)"
                : " (" + DecimalText.fixed(seconds / 3600.0, 1) + " h)";
    }

    private String tooEarly() {
        return "the coldest point ends '" + stageName() + "' at only " + Checks.c(stage.end().coldestK())
                + ", too cool to estimate a further hold from; lengthen '" + stageName() + "' (the part was heading"
                + " for " + Checks.c(stage.steadyK()) + ") or raise its air temperature";
    }

    private CureFigures basis() {
        if (basis == null) {
            basis = laterStagesGiveNoLessAfterALongerHold() ? wholeHistory : CureAnalysis.along(spec,
                    coldestUpTo(stage.endSeconds()), budget);
        }
        return basis;
    }

    private boolean laterStagesGiveNoLessAfterALongerHold() {
        List<StageOutcome> stages = history.stages();
        List<StageOutcome> laterStages = stages.subList(stages.indexOf(stage) + 1, stages.size());
        if (laterStages.isEmpty()) {
            return true;
        }
        if (stage.end().coldestK() > stage.steadyK()) {
            return false; // settling cooler: the later stages would start cooler than they did
        }
        for (StageOutcome later : laterStages) {
            EndCondition end = later.conditions().end();
            if (!(end instanceof EndCondition.AfterDuration || end instanceof EndCondition.HottestFallsTo)) {
                return false; // a stage that ends on reaching or holding a temperature ends sooner on a hotter part
            }
        }
        return true;
    }

    /** The coldest point's history from the start to {@code endSeconds}, on the history's own knots. */
    private TemperaturePath coldestUpTo(double endSeconds) {
        DenseHistory dense = history.dense();
        double[] knots = Arrays.stream(dense.knots()).filter(t -> t < endSeconds).toArray();
        double[] path = Arrays.copyOf(knots, knots.length + 1);
        path[knots.length] = endSeconds;
        return TemperaturePath.of(t -> dense.at(t).coldestK(), path);
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
