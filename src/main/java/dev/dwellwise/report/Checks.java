package dev.dwellwise.report;

import dev.dwellwise.job.Limits;
import dev.dwellwise.thermal.DecimalText;
import dev.dwellwise.thermal.EndCondition;
import dev.dwellwise.thermal.ModelSelector;
import dev.dwellwise.thermal.Physics;
import dev.dwellwise.thermal.StageEnd;
import dev.dwellwise.thermal.StageOutcome;
import dev.dwellwise.thermal.ThermalHistory;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/**
 * The checks of a thermal history: whether the model is valid for the part, whether each stage met
 * its condition, and the safety limits. Each check carries the figure that decided it, the limit,
 * and a sentence an operator can act on.
 */
public final class Checks {

    private Checks() {
    }

    /** Every thermal check of the history, in the order an operator reads them. */
    public static List<CheckResult> thermal(ModelSelector.Selection selection, Limits limits) {
        ThermalHistory history = selection.history();
        List<CheckResult> checks = new ArrayList<>();
        checks.add(modelValidity(selection));
        for (StageOutcome stage : history.stages()) {
            if (!(stage.conditions().end() instanceof EndCondition.AfterDuration)) {
                checks.add(stageEnd(stage));
            }
        }
        if (limits.maxPartTemperatureC() != null) {
            checks.add(peakTemperature(history, limits.maxPartTemperatureC()));
        }
        if (limits.handlingTemperatureC() != null) {
            checks.add(handlingTemperature(history, limits.handlingTemperatureC()));
        }
        if (limits.maxHeatingRateCPerMin() != null) {
            checks.add(heatingRate(history, limits.maxHeatingRateCPerMin()));
        }
        return checks;
    }

    static CheckResult modelValidity(ModelSelector.Selection selection) {
        ThermalHistory history = selection.history();
        double bi = history.largestBiotNumber();
        String where = "largest Biot number " + ModelSelector.format(bi) + " (stage '"
                + history.stageWith(Comparator.comparingDouble(StageOutcome::biotNumber)).conditions().name() + "')";
        double value = Rounding.significant(bi);
        String spread = Double.isNaN(selection.throughThicknessSpreadK()) ? ""
                : "; the surface and core differ by up to " + k1(selection.throughThicknessSpreadK());
        if (!"lumped".equals(history.modelName())) {
            return new CheckResult("model-validity", CheckResult.PASS, value, ModelSelector.BIOT_LIMIT,
                    where + ": through-thickness conduction computed with the " + history.modelName() + " model"
                            + spread, null);
        }
        if (selection.lumpedBeyondValidity()) {
            return new CheckResult("model-validity", CheckResult.FAIL, value, ModelSelector.BIOT_LIMIT,
                    where + " is at or above " + ModelSelector.BIOT_LIMIT + ": the lumped model treats the part as "
                            + "one temperature, but the slab model shows the surface and core differing by up to "
                            + k1(selection.throughThicknessSpreadK()) + "; use model auto or slab", null);
        }
        return new CheckResult("model-validity", CheckResult.PASS, value, ModelSelector.BIOT_LIMIT,
                where + " is below " + ModelSelector.BIOT_LIMIT
                        + ": the part heats evenly enough for the lumped model", null);
    }

    /**
     * A target at the steady temperature itself is only approached: the solve counts it met once the
     * part has settled to within about 5e-6 K (see SettledSegment), which a longer stage gives.
     */
    private static final String ONLY_SETTLED = "which a part only approaches (it counts as reached once "
            + "the part has settled to within about 5e-6 K, which a longer stage would give): ";

    static CheckResult stageEnd(StageOutcome stage) {
        String name = stage.conditions().name();
        boolean met = stage.ended() != StageEnd.MAX_SECONDS;
        String status = met ? CheckResult.PASS : CheckResult.FAIL;
        String steady = c(stage.steadyK());
        EndCondition end = stage.conditions().end();
        if (end instanceof EndCondition.ColdestReaches r) {
            double value = Rounding.temperature(Physics.toCelsius(stage.end().coldestK()));
            String detail = met
                    ? "coldest point reached " + c(r.kelvin()) + " at " + s(stage.endSeconds())
                    : "stage ended at its " + s(stage.endSeconds() - stage.startSeconds()) + " limit with the "
                            + "coldest point at " + c(stage.end().coldestK()) + ", short of " + c(r.kelvin())
                            + "; the part was heading for a steady " + steady
                            + advice(stage.steadyK(), r.kelvin(), true,
                                    ", the target itself, " + ONLY_SETTLED
                                            + "set the target below the temperature the part settles at",
                                    ", so it can never get there under these conditions: raise the air temperature"
                                            + " or lower the target",
                                    ": allow more time, or raise the air temperature or convection");
            return new CheckResult("stage-end", status, value, Rounding.temperature(Physics.toCelsius(r.kelvin())),
                    detail, name);
        }
        if (end instanceof EndCondition.HottestFallsTo f) {
            double value = Rounding.temperature(Physics.toCelsius(stage.end().hottestK()));
            String detail = met
                    ? "hottest point fell to " + c(f.kelvin()) + " at " + s(stage.endSeconds())
                    : "stage ended at its " + s(stage.endSeconds() - stage.startSeconds()) + " limit with the "
                            + "hottest point still at " + c(stage.end().hottestK()) + ", above " + c(f.kelvin())
                            + "; the part was heading for a steady " + steady
                            + advice(stage.steadyK(), f.kelvin(), false,
                                    ", the target itself, " + ONLY_SETTLED
                                            + "set the target above the temperature the part settles at",
                                    ", so it can never get there under these conditions: cool with colder air or"
                                            + " more airflow",
                                    ": allow more cooling time or more airflow");
            return new CheckResult("stage-end", status, value, Rounding.temperature(Physics.toCelsius(f.kelvin())),
                    detail, name);
        }
        EndCondition.HoldAbove h = (EndCondition.HoldAbove) end;
        double held = stage.holdSecondsAccumulated();
        String detail = met
                ? "coldest point held at or above " + c(h.kelvin()) + " for " + s(h.seconds()) + ", complete at "
                        + s(stage.endSeconds())
                : "stage ended at its " + s(stage.endSeconds() - stage.startSeconds()) + " limit with the coldest "
                        + "point held at or above " + c(h.kelvin()) + " for only " + s(held) + " of " + s(h.seconds())
                        + "; the part was heading for a steady " + steady
                        + advice(stage.steadyK(), h.kelvin(), true,
                                ", the hold temperature itself, " + ONLY_SETTLED
                                        + "set the hold below the temperature the part settles at",
                                ", below the hold temperature: raise the air temperature",
                                ": allow a longer stage");
        return new CheckResult("stage-end", status, Rounding.seconds(held), Rounding.seconds(h.seconds()), detail, name);
    }

    /**
     * What a stage that ran out of time should change, by where the part was heading: to the target
     * itself ({@code atTarget}), short of it ({@code never}: no stage length gets there), or past it
     * ({@code more}: a longer stage would). {@code rising}: the target is reached from below.
     */
    private static String advice(double steadyK, double targetK, boolean rising, String atTarget, String never,
                                 String more) {
        if (steadyK == targetK) {
            return atTarget;
        }
        return (rising ? steadyK < targetK : steadyK > targetK) ? never : more;
    }

    static CheckResult peakTemperature(ThermalHistory history, double limitC) {
        // judged on the figure as reported, so the value and the verdict never disagree
        double peakC = Rounding.temperature(Physics.toCelsius(history.peakK()));
        String where = " (stage '" + history.stageWith(Comparator.comparingDouble(StageOutcome::peakK)).conditions().name() + "')";
        boolean ok = peakC <= limitC;
        String detail = ok
                ? "hottest point peaked at " + c1(peakC) + where + ", within the " + c1(limitC) + " limit"
                : "hottest point peaked at " + c1(peakC) + where + ", " + k1(peakC - limitC) + " over the "
                        + c1(limitC) + " limit: over-bake risk; lower the air temperature or shorten the stage";
        return new CheckResult("peak-temperature", ok ? CheckResult.PASS : CheckResult.FAIL,
                peakC, limitC, detail, null);
    }

    static CheckResult handlingTemperature(ThermalHistory history, double limitC) {
        double endC = Rounding.temperature(Physics.toCelsius(history.finalState().hottestK()));
        boolean ok = endC <= limitC;
        String detail = ok
                ? "parts leave the last stage at " + c1(endC) + " at the hottest point, at or below the "
                        + c1(limitC) + " handling limit"
                : "parts leave the last stage at " + c1(endC) + " at the hottest point, above the " + c1(limitC)
                        + " handling limit: contact-burn risk; extend the cooling stage or add forced-air cooling";
        return new CheckResult("handling-temperature", ok ? CheckResult.PASS : CheckResult.FAIL,
                endC, limitC, detail, null);
    }

    static CheckResult heatingRate(ThermalHistory history, double limitCPerMin) {
        StageOutcome fastest = history.stageWith(Comparator.comparingDouble(StageOutcome::largestHeatingRate));
        double rate = Rounding.temperature(history.largestHeatingRate() * 60);
        boolean ok = rate <= limitCPerMin;
        String detail = "the part's mean temperature rises at up to " + DecimalText.fixed(rate, 1) + " °C/min (stage '"
                + fastest.conditions().name() + "'), " + (ok ? "within" : "faster than") + " the "
                + DecimalText.trimmed(limitCPerMin) + " °C/min limit"
                + (ok ? "" : ": risk of blistering or outgassing of the coating, or of thermal stress in the part; "
                        + "preheat more gently or lower the first zone's air");
        return new CheckResult("heating-rate", ok ? CheckResult.PASS : CheckResult.FAIL, rate,
                limitCPerMin, detail, null);
    }

    /** A kelvin temperature as °C with one decimal. */
    static String c(double kelvin) {
        return c1(Physics.toCelsius(kelvin));
    }

    static String c1(double celsius) {
        return DecimalText.fixed(celsius, 1) + " °C";
    }

    private static String k1(double kelvin) {
        return DecimalText.fixed(kelvin, 1) + " K";
    }

    static String s(double seconds) {
        return DecimalText.fixed(seconds, 1) + " s";
    }

}
