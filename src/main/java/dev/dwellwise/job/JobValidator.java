package dev.dwellwise.job;

import dev.dwellwise.thermal.MaterialLibrary;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.regex.Pattern;

/**
 * Checks every value of a bound job and names each offending field by its path. Collects all the
 * errors rather than stopping at the first, so a client fixes a request in one round trip.
 */
public final class JobValidator extends FieldChecks {

    private static final double MAX_CONVECTION = 10_000;
    private static final double MAX_THICKNESS_MM = 1000;
    private static final Set<String> MODELS = Set.of("auto", "lumped", "slab");
    /** A batch id goes into answers and log lines as it is, so only characters that are safe in both. */
    private static final Pattern SAFE_BATCH_ID = Pattern.compile("[A-Za-z0-9._:/-]{1,128}");
    /** Where the job sits in a release request, for its field paths. */
    public static final String RELEASE_JOB_PREFIX = "job.";

    private final MaterialLibrary library;
    private final JobLimits limits;

    private JobValidator(MaterialLibrary library, JobLimits limits) {
        super(new ArrayList<>());
        this.library = library;
        this.limits = limits;
    }

    /** Throws {@link InvalidJobException} listing every invalid field; returns the job with defaults. */
    public static Job validated(Job job, MaterialLibrary library, JobLimits limits) {
        return validated(job, library, limits, "");
    }

    /** As {@link #validated(Job, MaterialLibrary, JobLimits)}, with field paths under {@code prefix} ({@code job.}). */
    public static Job validated(Job job, MaterialLibrary library, JobLimits limits, String prefix) {
        JobValidator v = new JobValidator(library, limits);
        if (job == null) {
            throw new InvalidJobException(prefix.isEmpty() ? "body" : prefix.substring(0, prefix.length() - 1),
                    "a job object is required");
        }
        v.job(job, prefix);
        if (!v.errors.isEmpty()) {
            throw new InvalidJobException(v.errors);
        }
        return job.withDefaults();
    }

    /**
     * Validates a release request, its batch id and its job (field paths under {@code job.}), and
     * throws {@link InvalidJobException} listing every error of both; returns the job with defaults.
     */
    public static Job validated(ReleaseRequest request, MaterialLibrary library, JobLimits limits) {
        List<FieldError> errors = new ArrayList<>();
        if (request.batchId() == null) {
            errors.add(new FieldError("batchId", "is required"));
        } else if (!SAFE_BATCH_ID.matcher(request.batchId()).matches()) {
            errors.add(new FieldError("batchId", "must be 1 to 128 letters, digits and . _ : / -"));
        }
        Job job = null;
        try {
            job = validated(request.job(), library, limits, RELEASE_JOB_PREFIX);
        } catch (InvalidJobException e) {
            errors.addAll(e.errors());
        }
        if (!errors.isEmpty()) {
            throw new InvalidJobException(errors);
        }
        return job;
    }

    private void job(Job job, String p) {
        if (required(job.part(), p + "part")) {
            part(job.part(), p + "part");
        }
        stages(job.stages(), p + "stages");
        if (job.cure() != null) {
            new CureValidator(errors).cure(job.cure(), p + "cure");
        }
        if (job.limits() != null) {
            limitsOf(job.limits(), p + "limits");
        }
        if (job.model() != null && !MODELS.contains(job.model())) {
            add(p + "model", "must be one of auto, lumped, slab");
        }
        if (job.slabCells() != null && (job.slabCells() < 4 || job.slabCells() > limits.maxSlabCells())) {
            add(p + "slabCells", "must be between 4 and " + limits.maxSlabCells());
        }
        if (job.output() != null) {
            output(job.output(), p + "output");
        }
    }

    private void part(Part part, String p) {
        boolean single = part.material() != null || part.thicknessMm() != null;
        if (part.layers() != null && single) {
            add(p + ".layers", "give either layers or material with thicknessMm, not both");
        } else if (part.layers() != null) {
            layers(part.layers(), p + ".layers");
        } else {
            if (required(part.material(), p + ".material")) {
                material(part.material(), p + ".material");
            }
            thickness(part.thicknessMm(), p + ".thicknessMm");
        }
        if (part.exposedFaces() != null && part.exposedFaces() != 1 && part.exposedFaces() != 2) {
            add(p + ".exposedFaces", "must be 1 (back face insulated) or 2");
        }
        if (required(part.emissivity(), p + ".emissivity")) {
            range(part.emissivity(), 0, 1, p + ".emissivity");
        }
        if (required(part.initialTemperatureC(), p + ".initialTemperatureC")) {
            temperature(part.initialTemperatureC(), p + ".initialTemperatureC");
        }
    }

    private void layers(List<LayerSpec> layers, String p) {
        if (layers.isEmpty()) {
            add(p, "must hold at least one layer");
        } else if (layers.size() > limits.maxLayers()) {
            add(p, "at most " + limits.maxLayers() + " layers");
        }
        for (int i = 0; i < layers.size() && i < limits.maxLayers(); i++) {
            String lp = p + "[" + i + "]";
            LayerSpec layer = layers.get(i);
            if (required(layer, lp)) {
                if (required(layer.material(), lp + ".material")) {
                    material(layer.material(), lp + ".material");
                }
                thickness(layer.thicknessMm(), lp + ".thicknessMm");
            }
        }
    }

    private void thickness(Double mm, String p) {
        if (required(mm, p) && finite(mm, p) && !(mm > 0 && mm <= MAX_THICKNESS_MM)) {
            add(p, "must be above 0 and at most " + (int) MAX_THICKNESS_MM + " mm");
        }
    }

    private void material(MaterialRef m, String p) {
        if (m.isLibrary()) {
            if (library.find(m.id()).isEmpty()) {
                add(p, "unknown material '" + m.id() + "'; GET /v1/materials lists the ids");
            }
            return;
        }
        positive(m.densityKgPerM3(), p + ".densityKgPerM3", true);
        property(m.specificHeatJPerKgK(), m.specificHeatTable(), p, "specificHeatJPerKgK", "specificHeatTable",
                pt -> pt == null ? null : new double[] {nz(pt.temperatureC()), nz(pt.specificHeatJPerKgK())},
                pt -> pt != null && pt.temperatureC() != null && pt.specificHeatJPerKgK() != null);
        property(m.conductivityWPerMK(), m.conductivityTable(), p, "conductivityWPerMK", "conductivityTable",
                pt -> pt == null ? null : new double[] {nz(pt.temperatureC()), nz(pt.conductivityWPerMK())},
                pt -> pt != null && pt.temperatureC() != null && pt.conductivityWPerMK() != null);
    }

    private <T> void property(Double constant, List<T> table, String p, String constantName, String tableName,
                              java.util.function.Function<T, double[]> point,
                              java.util.function.Predicate<T> complete) {
        if (constant != null && table != null) {
            add(p + "." + tableName, "give either " + constantName + " or " + tableName + ", not both");
            return;
        }
        if (table == null) {
            positive(constant, p + "." + constantName, true);
            return;
        }
        String tp = p + "." + tableName;
        if (table.isEmpty() || table.size() > limits.maxTablePoints()) {
            add(tp, "must hold 1 to " + limits.maxTablePoints() + " points");
            return;
        }
        double previous = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < table.size(); i++) {
            String ip = tp + "[" + i + "]";
            if (!complete.test(table.get(i))) {
                add(ip, "each point needs temperatureC and " + constantName);
                continue;
            }
            double[] xy = point.apply(table.get(i));
            if (temperature(xy[0], ip + ".temperatureC")) {
                if (!(xy[0] > previous)) {
                    add(ip + ".temperatureC", "table temperatures must increase strictly");
                }
                previous = xy[0];
            }
            positive(xy[1], ip + "." + constantName, true);
        }
    }

    private void stages(List<Stage> stages, String p) {
        if (!required(stages, p)) {
            return;
        }
        if (stages.isEmpty()) {
            add(p, "must hold at least one stage");
            return;
        }
        if (stages.size() > limits.maxStages()) {
            add(p, "at most " + limits.maxStages() + " stages");
            return;
        }
        double span = 0;
        for (int i = 0; i < stages.size(); i++) {
            String sp = p + "[" + i + "]";
            Stage stage = stages.get(i);
            if (required(stage, sp)) {
                span += stage(stage, sp);
            }
        }
        if (span > limits.maxSpanSeconds()) {
            add(p, "the stages may last up to " + (long) span + " s in all, beyond the limit of "
                    + (long) limits.maxSpanSeconds() + " s; give each stage a smaller maxSeconds");
        }
    }

    /**
     * Whether a name can go into the answer's reasons and the SVG chart as it stands: XML 1.0 allows
     * no control character but tab and line breaks, an unpaired surrogate has no UTF-8 form, and a
     * bidirectional override could make a report read other than it is. None has a place in a name.
     */
    private static boolean printable(String text) {
        for (int i = 0; i < text.length(); ) {
            int c = text.codePointAt(i);
            if (Character.isISOControl(c) || Character.getType(c) == Character.SURROGATE
                    || c >= 0x202A && c <= 0x202E || c >= 0x2066 && c <= 0x2069) {
                return false;
            }
            i += Character.charCount(c);
        }
        return true;
    }

    /** Validates one stage; returns the longest it may last (0 where that is invalid). */
    private double stage(Stage s, String p) {
        if (s.name() != null && (s.name().isBlank() || s.name().length() > 80)) {
            add(p + ".name", "must be 1 to 80 characters");
        } else if (s.name() != null && !printable(s.name())) {
            add(p + ".name", "must not hold control characters, unpaired surrogates or bidirectional-text controls");
        }
        if (required(s.airTemperatureC(), p + ".airTemperatureC")) {
            temperature(s.airTemperatureC(), p + ".airTemperatureC");
        }
        if (required(s.convectionWPerM2K(), p + ".convectionWPerM2K")) {
            range(s.convectionWPerM2K(), 0, MAX_CONVECTION, p + ".convectionWPerM2K");
        }
        if (s.surroundingsTemperatureC() != null) {
            temperature(s.surroundingsTemperatureC(), p + ".surroundingsTemperatureC");
        }
        boolean timed = s.until() != null && s.until().seconds() != null;
        if (s.airEndTemperatureC() != null) {
            if (temperature(s.airEndTemperatureC(), p + ".airEndTemperatureC") && !timed) {
                add(p + ".airEndTemperatureC", "a ramp needs a stage that ends after fixed seconds (until.seconds)");
            }
        }
        if (s.surroundingsEndTemperatureC() != null
                && temperature(s.surroundingsEndTemperatureC(), p + ".surroundingsEndTemperatureC")) {
            if (!timed) {
                add(p + ".surroundingsEndTemperatureC",
                        "a ramp needs a stage that ends after fixed seconds (until.seconds)");
            } else if (s.surroundingsTemperatureC() == null) {
                add(p + ".surroundingsEndTemperatureC", "needs surroundingsTemperatureC, the start of the ramp");
            }
        }
        double bound = 0;
        if (s.maxSeconds() != null && finite(s.maxSeconds(), p + ".maxSeconds")) {
            if (!(s.maxSeconds() > 0 && s.maxSeconds() <= limits.maxStageSeconds())) {
                add(p + ".maxSeconds", "must be above 0 and at most " + (long) limits.maxStageSeconds() + " s");
            } else {
                bound = s.maxSeconds();
            }
        }
        if (required(s.until(), p + ".until")) {
            double seconds = until(s.until(), p + ".until", s.maxSeconds());
            if (seconds > 0) {
                bound = seconds;
            } else if (s.maxSeconds() == null) {
                bound = Stage.DEFAULT_MAX_SECONDS;
            }
        }
        return bound;
    }

    /** Validates an end condition; returns its fixed duration (0 when it has none or it is invalid). */
    private double until(Until u, String p, Double maxSeconds) {
        int forms = u.formsGiven();
        if (forms == 0) {
            add(p, "give one of seconds, partAboveC, partBelowC, or holdAboveC with holdSeconds");
            return 0;
        }
        if (forms > 1) {
            add(p, "give exactly one of seconds, partAboveC, partBelowC, or holdAboveC with holdSeconds");
            return 0;
        }
        if (u.seconds() != null) {
            if (!finite(u.seconds(), p + ".seconds")) {
                return 0;
            }
            if (!(u.seconds() > 0 && u.seconds() <= limits.maxStageSeconds())) {
                add(p + ".seconds", "must be above 0 and at most " + (long) limits.maxStageSeconds() + " s");
                return 0;
            }
            if (maxSeconds != null && u.seconds() > maxSeconds) {
                add(p + ".seconds", "is longer than the stage's maxSeconds");
            }
            return u.seconds();
        }
        if (u.partAboveC() != null) {
            temperature(u.partAboveC(), p + ".partAboveC");
        } else if (u.partBelowC() != null) {
            temperature(u.partBelowC(), p + ".partBelowC");
        } else {
            if (required(u.holdAboveC(), p + ".holdAboveC")) {
                temperature(u.holdAboveC(), p + ".holdAboveC");
            }
            if (required(u.holdSeconds(), p + ".holdSeconds") && finite(u.holdSeconds(), p + ".holdSeconds")
                    && !(u.holdSeconds() > 0 && u.holdSeconds() <= limits.maxStageSeconds())) {
                add(p + ".holdSeconds", "must be above 0 and at most " + (long) limits.maxStageSeconds() + " s");
            }
        }
        return 0;
    }

    private void limitsOf(Limits l, String p) {
        if (l.maxPartTemperatureC() != null) {
            temperature(l.maxPartTemperatureC(), p + ".maxPartTemperatureC");
        }
        if (l.handlingTemperatureC() != null) {
            temperature(l.handlingTemperatureC(), p + ".handlingTemperatureC");
        }
        positive(l.maxHeatingRateCPerMin(), p + ".maxHeatingRateCPerMin", false);
    }

    private void output(Output o, String p) {
        if (o.sampleSeconds() != null && finite(o.sampleSeconds(), p + ".sampleSeconds")
                && !(o.sampleSeconds() >= limits.minSampleSeconds() && o.sampleSeconds() <= 86_400)) {
            add(p + ".sampleSeconds", "must be from " + limits.minSampleSeconds() + " to 86400 s");
        }
        if (o.profiles() != null) {
            List<Double> times = o.profiles().timesSeconds();
            String tp = p + ".profiles.timesSeconds";
            if (!required(times, tp)) {
                return;
            }
            if (times.size() > limits.maxProfiles()) {
                add(tp, "at most " + limits.maxProfiles() + " profile times");
                return;
            }
            for (int i = 0; i < times.size(); i++) {
                Double t = times.get(i);
                if (required(t, tp + "[" + i + "]") && finite(t, tp + "[" + i + "]") && t < 0) {
                    add(tp + "[" + i + "]", "must be 0 or more seconds");
                }
            }
        }
    }

    private static double nz(Double d) {
        return d == null ? Double.NaN : d;
    }
}
