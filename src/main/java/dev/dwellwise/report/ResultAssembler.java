package dev.dwellwise.report;

import dev.dwellwise.job.Job;
import dev.dwellwise.thermal.ModelSelector;
import dev.dwellwise.thermal.Physics;
import dev.dwellwise.thermal.Profile;
import dev.dwellwise.thermal.SampledSeries;
import dev.dwellwise.thermal.StageOutcome;
import dev.dwellwise.thermal.ThermalHistory;
import java.util.ArrayList;
import java.util.List;

/** Writes a history and its checks up as the answer: °C, rounded, columnar series. */
public final class ResultAssembler {

    private ResultAssembler() {
    }

    public static SimulationResult assemble(Job job, ModelSelector.Selection selection, CureReport cure,
                                            List<CheckResult> checks, Provenance provenance) {
        ThermalHistory history = selection.history();
        boolean failed = checks.stream().anyMatch(CheckResult::failed);
        List<StageReport> stages = new ArrayList<>();
        for (StageOutcome s : history.stages()) {
            stages.add(stage(s));
        }
        return new SimulationResult(failed ? SimulationResult.FAIL : SimulationResult.PASS,
                new ModelReport(history.modelName(), selection.requested(), selection.reason()),
                Rounding.seconds(history.totalSeconds()), stages, cure, checks,
                Boolean.TRUE.equals(job.output().series()) ? series(history.series()) : null,
                job.output().profiles() == null ? null : profiles(history.profiles()),
                provenance, Cautions.ALL);
    }

    private static StageReport stage(StageOutcome s) {
        return new StageReport(s.conditions().name(), Rounding.seconds(s.startSeconds()),
                Rounding.seconds(s.endSeconds()), s.ended().wireName(), celsius(s.start().meanK()),
                celsius(s.end().meanK()), celsius(s.peakK()), celsius(s.end().surfaceK()), celsius(s.end().coreK()),
                Rounding.significant(s.biotNumber()), Rounding.significant(s.largestRadiationCoefficient()),
                celsius(s.steadyK()),
                s.conditions().end() instanceof dev.dwellwise.thermal.EndCondition.HoldAbove
                        ? Rounding.seconds(s.holdSecondsAccumulated()) : null);
    }

    /** The series as the wire carries it; also the source of the CSV rendering. */
    public static SeriesReport series(SampledSeries series) {
        double[] time = series.timeSeconds();
        for (int i = 0; i < time.length; i++) {
            time[i] = Rounding.seconds(time[i]);
        }
        return new SeriesReport(time, celsius(series.meanK()), celsius(series.surfaceK()), celsius(series.coreK()),
                series.stageIndex());
    }

    private static List<ProfileReport> profiles(List<Profile> profiles) {
        List<ProfileReport> out = new ArrayList<>();
        for (Profile p : profiles) {
            double[] mm = p.positionsM();
            for (int i = 0; i < mm.length; i++) {
                mm[i] = Rounding.fixed(mm[i] * 1000, 6);
            }
            out.add(new ProfileReport(Rounding.seconds(p.timeSeconds()), mm, celsius(p.temperaturesK())));
        }
        return out;
    }

    private static double celsius(double kelvin) {
        return Rounding.temperature(Physics.toCelsius(kelvin));
    }

    private static double[] celsius(double[] kelvin) {
        double[] out = new double[kelvin.length];
        for (int i = 0; i < out.length; i++) {
            out[i] = celsius(kelvin[i]);
        }
        return out;
    }
}
