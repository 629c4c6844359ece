package dev.dwellwise.job;

import dev.dwellwise.thermal.ComputeBudget;
import dev.dwellwise.thermal.EndCondition;
import dev.dwellwise.thermal.Layer;
import dev.dwellwise.thermal.Material;
import dev.dwellwise.thermal.MaterialLibrary;
import dev.dwellwise.thermal.Physics;
import dev.dwellwise.thermal.PropertyCurve;
import dev.dwellwise.thermal.StageConditions;
import dev.dwellwise.thermal.ThermalPart;
import dev.dwellwise.thermal.ThermalProblem;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Function;

/** Turns a validated job (defaults filled) into the solver's problem: SI units, kelvin, resolved materials. */
public final class ProblemBuilder {

    /** A spacing longer than any schedule the validator admits (40 days): no sample falls inside it. */
    private static final double UNSAMPLED_SECONDS = 1e9;

    private final MaterialLibrary library;

    public ProblemBuilder(MaterialLibrary library) {
        this.library = library;
    }

    public ThermalProblem build(Job job, ComputeBudget budget) {
        List<StageConditions> stages = new ArrayList<>();
        for (int i = 0; i < job.stages().size(); i++) {
            stages.add(stage(job.stages().get(i), i));
        }
        List<Double> profileTimes = job.output().profiles() == null ? List.of()
                : job.output().profiles().timesSeconds();
        return new ThermalProblem(part(job.part()), stages, sampleSeconds(job.output()), budget, profileTimes);
    }

    /**
     * The sample spacing the solver uses. A job that wants no series gets only the stage boundaries
     * and events sampled, so that a fine {@code sampleSeconds} it does not need cannot trip the
     * sample budget (the compute-limit problem tells clients to set {@code output.series} to false).
     */
    private static double sampleSeconds(Output output) {
        return Boolean.TRUE.equals(output.series()) ? output.sampleSeconds() : UNSAMPLED_SECONDS;
    }

    public ThermalPart part(Part part) {
        List<Layer> layers = new ArrayList<>();
        if (part.layers() != null) {
            for (LayerSpec layer : part.layers()) {
                layers.add(new Layer(material(layer.material()), layer.thicknessMm() / 1000));
            }
        } else {
            layers.add(new Layer(material(part.material()), part.thicknessMm() / 1000));
        }
        return new ThermalPart(layers, part.exposedFaces(), part.emissivity(),
                Physics.toKelvin(part.initialTemperatureC()));
    }

    public Material material(MaterialRef ref) {
        if (ref.isLibrary()) {
            return library.find(ref.id()).orElseThrow(
                    () -> new InvalidJobException("part.material", "unknown material '" + ref.id() + "'"));
        }
        PropertyCurve specificHeat = ref.specificHeatTable() == null
                ? PropertyCurve.constant(ref.specificHeatJPerKgK())
                : curve(ref.specificHeatTable(), MaterialRef.SpecificHeatPoint::temperatureC,
                        MaterialRef.SpecificHeatPoint::specificHeatJPerKgK);
        PropertyCurve conductivity = ref.conductivityTable() == null
                ? PropertyCurve.constant(ref.conductivityWPerMK())
                : curve(ref.conductivityTable(), MaterialRef.ConductivityPoint::temperatureC,
                        MaterialRef.ConductivityPoint::conductivityWPerMK);
        return new Material("custom", ref.name() == null ? "custom material" : ref.name(), ref.densityKgPerM3(),
                specificHeat, conductivity, "given in the job");
    }

    private static <T> PropertyCurve curve(List<T> points, Function<T, Double> temperatureC, Function<T, Double> value) {
        double[] kelvin = new double[points.size()];
        double[] values = new double[points.size()];
        for (int i = 0; i < points.size(); i++) {
            kelvin[i] = Physics.toKelvin(temperatureC.apply(points.get(i)));
            values[i] = value.apply(points.get(i));
        }
        return PropertyCurve.table(kelvin, values);
    }

    private static StageConditions stage(Stage s, int index) {
        double airStart = Physics.toKelvin(s.airTemperatureC());
        double airEnd = s.airEndTemperatureC() == null ? airStart : Physics.toKelvin(s.airEndTemperatureC());
        double surStart;
        double surEnd;
        if (s.surroundingsTemperatureC() == null) {
            // the surroundings follow the air, ramp included
            surStart = airStart;
            surEnd = airEnd;
        } else {
            surStart = Physics.toKelvin(s.surroundingsTemperatureC());
            surEnd = s.surroundingsEndTemperatureC() == null ? surStart
                    : Physics.toKelvin(s.surroundingsEndTemperatureC());
        }
        Until u = s.until();
        EndCondition end;
        double bound;
        if (u.seconds() != null) {
            end = new EndCondition.AfterDuration(u.seconds());
            bound = u.seconds();
        } else {
            bound = s.maxSeconds();
            if (u.partAboveC() != null) {
                end = new EndCondition.ColdestReaches(Physics.toKelvin(u.partAboveC()));
            } else if (u.partBelowC() != null) {
                end = new EndCondition.HottestFallsTo(Physics.toKelvin(u.partBelowC()));
            } else {
                end = new EndCondition.HoldAbove(Physics.toKelvin(u.holdAboveC()), u.holdSeconds());
            }
        }
        return new StageConditions(displayName(s, index), airStart, airEnd, surStart, surEnd,
                s.convectionWPerM2K(), end, bound);
    }

    /** The stage's name, or {@code stage N} (1-based) when the job gives none. */
    public static String displayName(Stage s, int index) {
        return s.name() != null ? s.name() : "stage " + (index + 1);
    }
}
