package dev.dwellwise.report;

import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.dwellwise.cure.CureBudget;
import dev.dwellwise.job.Cure;
import dev.dwellwise.job.CureKinetics;
import dev.dwellwise.job.Job;
import dev.dwellwise.job.JobLimits;
import dev.dwellwise.job.Limits;
import dev.dwellwise.job.MaterialRef;
import dev.dwellwise.job.Output;
import dev.dwellwise.job.Part;
import dev.dwellwise.job.Stage;
import dev.dwellwise.job.Until;
import dev.dwellwise.thermal.ComputeBudget;
import dev.dwellwise.thermal.LumpedModel;
import dev.dwellwise.thermal.MaterialLibrary;
import dev.dwellwise.thermal.ModelSelector;
import dev.dwellwise.thermal.SlabModel;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Jobs whose histories are known in closed form, for the cure integration tests: a 2 mm plate of
 * AISI 1010 (7832 kg/m3, 434 J/kgK, 63.9 W/mK at 300 K, REFERENCES.md section 4, Incropera Table
 * A.1 [M]) heated on both faces by convection alone (emissivity 0), so that in air at T_air from
 * T_0 it follows T(t) = T_air + (T_0 − T_air) exp(−t/tau), tau = rho c Lc / h (Incropera Eqs.
 * 5.6–5.7 [M]); a part that starts at the air temperature stays there (an isothermal hold).
 */
final class CureJobs {

    /** R = N_A k, CODATA 2018 (REFERENCES.md section 3 [C]): the tests' own, not the service's constant. */
    static final double R = 8.314462618;

    /** Lc = 1 mm; at h = 30: tau = 113.303 s (REFERENCES.md section 2 [C]). */
    static double tau(double h) {
        return 7832 * 434 * 0.001 / h;
    }

    private static final Pattern HOLD = Pattern.compile("about (\\d+) s");

    private CureJobs() {
    }

    static Simulator simulator() {
        return simulator(CureBudget.standard());
    }

    static Simulator simulator(CureBudget budget) {
        return new Simulator(MaterialLibrary.bundled(), new ModelSelector(new LumpedModel(), new SlabModel()),
                JobLimits.standard(), ComputeBudget.standard(), budget, "dwellwise test");
    }

    static Stage timed(String name, double airC, double h, double seconds) {
        return new Stage(name, airC, null, h, null, null, new Until(seconds, null, null, null, null), null);
    }

    /** The plate from {@code initialC} through the stages, judged by {@code cure}. */
    static Job job(double initialC, Cure cure, Stage... stages) {
        Part plate = new Part(MaterialRef.custom("AISI 1010 at 300 K", 7832.0, 434.0, 63.9, null, null), 2.0, null, 2,
                0.0, initialC);
        return new Job(plate, List.of(stages), cure, null, "lumped", null, new Output(null, false, null));
    }

    /** The same job on the slab model with the part {@code thicknessMm} thick: its surface leads its core. */
    static Job onSlab(Job job, double thicknessMm) {
        Part p = job.part();
        Part thick = new Part(p.material(), thicknessMm, null, p.exposedFaces(), p.emissivity(), p.initialTemperatureC());
        return new Job(thick, job.stages(), job.cure(), job.limits(), "slab", null, job.output());
    }

    /** The plate held at {@code c} for {@code seconds}: it starts at the air temperature and stays there. */
    static Job isothermal(double c, double seconds, Cure cure) {
        return job(c, cure, timed("hold", c, 30, seconds));
    }

    /** The same job with stage {@code index} (a timed stage) lasting {@code seconds}. */
    static Job withStageSeconds(Job job, int index, double seconds) {
        List<Stage> stages = new ArrayList<>(job.stages());
        Stage s = stages.get(index);
        stages.set(index, timed(s.name(), s.airTemperatureC(), s.convectionWPerM2K(), seconds));
        return new Job(job.part(), stages, job.cure(), job.limits(), job.model(), job.slabCells(), job.output());
    }

    /** The same job judged against other limits. */
    static Job withLimits(Job job, Limits limits) {
        return new Job(job.part(), job.stages(), job.cure(), limits, job.model(), job.slabCells(), job.output());
    }

    /** The same job judged against another cure specification. */
    static Job withCure(Job job, Cure cure) {
        return new Job(job.part(), job.stages(), cure, job.limits(), job.model(), job.slabCells(), job.output());
    }

    static Cure timeAbove(double c, double min, Double max) {
        return new Cure(new Cure.TimeAbove(c, min, max), null, null);
    }

    static Cure equivalentTime(double referenceC, double kJPerMol, double min, Double max) {
        return new Cure(null, new Cure.EquivalentTime(referenceC, kJPerMol, min, max), null);
    }

    static Cure nthOrder(double a, double kJPerMol, double order, double minDegree,
                         CureKinetics.GlassTransition glass) {
        return new Cure(null, null, new CureKinetics.NthOrder(a, kJPerMol, order, minDegree, null, glass));
    }

    static CheckResult check(SimulationResult result, String name) {
        return result.checks().stream().filter(c -> c.name().equals(name)).findFirst()
                .orElseThrow(() -> new AssertionError("no check " + name + " in " + names(result)));
    }

    private static String names(SimulationResult result) {
        return Arrays.toString(result.checks().stream().map(CheckResult::name).toArray());
    }

    /** The whole seconds of extra hold a failed check's sentence proposes. */
    static long proposedHold(CheckResult check) {
        Matcher m = HOLD.matcher(check.detail());
        assertTrue(m.find(), () -> "no hold estimate in: " + check.detail());
        return Long.parseLong(m.group(1));
    }
}
