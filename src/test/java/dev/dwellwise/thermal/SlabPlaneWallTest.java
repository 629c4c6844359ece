package dev.dwellwise.thermal;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The slab against the exact series of the plane wall with convection (Incropera and DeWitt,
 * <i>Fundamentals of Heat and Mass Transfer</i>, 6th ed., Eq. 5.42 [M]; REFERENCES.md section 1),
 * implemented independently in {@link PlaneWallSeries}. Emissivity 0: the boundary is pure convection.
 * The invented test solid has L^2/alpha = 300 s for a 10 mm conduction length.
 */
class SlabPlaneWallTest {

    private static final double HALF = 0.01;
    private static final double TIME_SCALE = 300;
    private static final double AIR_C = 200;
    private static final double START_C = 20;

    /** The slab target of DESIGN.md section 2 at default resolution, here against the exact solution. */
    private static final double DEFAULT_TARGET_K = 0.05;

    /**
     * Fine resolution: 4x the default cells leave 1/16 of the default's spatial error (second order,
     * measured up to 0.03 K) and the tight tolerance a negligible temporal one; 0.004 K holds both with margin.
     */
    private static final double FINE_TARGET_K = 0.004;

    /** The wall as one face of 10 mm, two faces of 20 mm (symmetric: computed on its half), or two faces of 20 mm cut 6/14 mm (asymmetric: computed whole). */
    private static ThermalPart wall(String layout) {
        Material solid = Parts.testSolid();
        double startK = Physics.toKelvin(START_C);
        return switch (layout) {
            case "one-face" -> new ThermalPart(List.of(new Layer(solid, HALF)), 1, 0, startK);
            case "two-faces" -> new ThermalPart(List.of(new Layer(solid, 2 * HALF)), 2, 0, startK);
            case "two-faces-cut" -> new ThermalPart(List.of(new Layer(solid, 0.006), new Layer(solid, 0.014)), 2, 0, startK);
            default -> throw new IllegalArgumentException(layout);
        };
    }

    @ParameterizedTest(name = "Bi {0}, {1}")
    @CsvSource({"1, one-face", "1, two-faces", "1, two-faces-cut", "10, one-face", "10, two-faces", "10, two-faces-cut"})
    void centreAndSurfaceFollowTheExactSeries(double biot, String layout) {
        ThermalPart part = wall(layout);
        double h = biot * 0.6 / HALF;
        ThermalProblem problem = Parts.problem(part, 7,
                Parts.stage("bake", AIR_C, AIR_C, h, new EndCondition.AfterDuration(600), 600));
        PlaneWallSeries series = new PlaneWallSeries(biot);
        assertFollowsSeries(StageRunner.run(problem, new SlabModel()), series, DEFAULT_TARGET_K);
        assertFollowsSeries(StageRunner.run(problem, new SlabModel(new SlabResolution(160, 1e-8))), series,
                FINE_TARGET_K);
    }

    /** Over Fo 0.02 to 2, at the samples (which fall between step ends: the dense output is judged too). */
    private static void assertFollowsSeries(ThermalHistory history, PlaneWallSeries series, double tolerance) {
        double[] time = history.series().timeSeconds();
        double[] surface = history.series().surfaceK();
        double[] core = history.series().coreK();
        double[] mean = history.series().meanK();
        double air = Physics.toKelvin(AIR_C);
        double span = START_C - AIR_C;
        for (int i = 0; i < time.length; i++) {
            double fo = time[i] / TIME_SCALE;
            if (fo < 0.02) {
                continue;
            }
            assertEquals(air + span * series.theta(1, fo), surface[i], tolerance, "surface at Fo " + fo);
            assertEquals(air + span * series.theta(0, fo), core[i], tolerance, "centre at Fo " + fo);
            assertEquals(air + span * series.meanTheta(fo), mean[i], tolerance, "mean at Fo " + fo);
        }
    }

    @ParameterizedTest(name = "ramp starting {0} s into the job")
    @CsvSource({"0", "120"})
    void aRampingAirTemperatureFollowsDuhamelsSuperpositionOfTheSeries(double rampStart) {
        // Air ramps at r = 0.25 K/s from the part's temperature, after an optional idle stage in air at
        // the part's own temperature (nothing changes there): the ramp's clock starts at its stage.
        double rate = 0.25;
        double duration = 600;
        double startK = Physics.toKelvin(START_C);
        double h = 1 * 0.6 / HALF;
        StageConditions ramp = new StageConditions("ramp", startK, startK + rate * duration, startK,
                startK + rate * duration, h, new EndCondition.AfterDuration(duration), duration);
        List<StageConditions> stages = rampStart > 0
                ? List.of(Parts.stage("idle", START_C, START_C, h, new EndCondition.AfterDuration(rampStart), rampStart), ramp)
                : List.of(ramp);
        ThermalProblem problem = new ThermalProblem(wall("one-face"), stages, 7, ComputeBudget.standard(), List.of());
        ThermalHistory history = StageRunner.run(problem, new SlabModel());
        PlaneWallSeries series = new PlaneWallSeries(1);
        double[] time = history.series().timeSeconds();
        double[] surface = history.series().surfaceK();
        double[] core = history.series().coreK();
        double scale = rate * TIME_SCALE; // r L^2 / alpha, kelvin
        for (int i = 0; i < time.length; i++) {
            double fo = (time[i] - rampStart) / TIME_SCALE;
            if (fo < 0.02) {
                continue;
            }
            // The ramp spans 150 K, less than the 180 K step above, and starts smoothly: the same target holds.
            assertEquals(startK + scale * series.rampResponse(1, fo), surface[i], DEFAULT_TARGET_K, "surface at " + time[i]);
            assertEquals(startK + scale * series.rampResponse(0, fo), core[i], DEFAULT_TARGET_K, "back face at " + time[i]);
        }
    }
}
