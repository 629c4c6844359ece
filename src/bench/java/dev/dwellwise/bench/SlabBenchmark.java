package dev.dwellwise.bench;

import dev.dwellwise.thermal.ComputeBudget;
import dev.dwellwise.thermal.EndCondition;
import dev.dwellwise.thermal.Layer;
import dev.dwellwise.thermal.MaterialLibrary;
import dev.dwellwise.thermal.Physics;
import dev.dwellwise.thermal.SlabModel;
import dev.dwellwise.thermal.StageConditions;
import dev.dwellwise.thermal.StageRunner;
import dev.dwellwise.thermal.ThermalHistory;
import dev.dwellwise.thermal.ThermalPart;
import dev.dwellwise.thermal.ThermalProblem;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Threads;

/**
 * The slab back end on a one-hour schedule: a 25 mm carbon-steel plate (tabulated properties,
 * radiation on) heated 45 minutes in a 220 °C oven and cooled 15 minutes, exposed on one face so the
 * whole thickness is resolved, at 40 cells (the benchmark case) and the default.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Threads(1)
public class SlabBenchmark {

    @Param({"40"})
    public int cells;

    private ThermalProblem problem;
    private SlabModel model;

    @Setup
    public void setUp() {
        ThermalPart part = new ThermalPart(List.of(new Layer(
                MaterialLibrary.bundled().find("steel-1010").orElseThrow(), 0.025)), 1, 0.85, Physics.toKelvin(20));
        double k = Physics.KELVIN_OFFSET;
        StageConditions bake = new StageConditions("bake", k + 220, k + 220, k + 220, k + 220, 35,
                new EndCondition.AfterDuration(2700), 2700);
        StageConditions cool = new StageConditions("cool", k + 25, k + 25, k + 25, k + 25, 20,
                new EndCondition.AfterDuration(900), 900);
        problem = new ThermalProblem(part, List.of(bake, cool), 10, ComputeBudget.standard(), List.of());
        model = new SlabModel(cells);
    }

    @Benchmark
    public ThermalHistory oneHourSchedule() {
        return StageRunner.run(problem, model);
    }
}
