package dev.dwellwise.thermal;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.api.Test;

/** The slab's dense output: what {@link Segment} promises, read back from one solve. */
class SlabSegmentTest {

    @Test
    void observationsAreConsistentWithTheProfileAndTheStepEnds() {
        ThermalPart part = new ThermalPart(List.of(new Layer(SlabEquationsTest.steelTable(), 0.004),
                new Layer(SlabEquationsTest.insulation(), 0.012)), 2, 0.85, 300);
        Stepper stepper = new SlabModel().newStepper(part, ComputeBudget.standard());
        stepper.enterStage(Parts.stage("bake", 220, 240, 35, new EndCondition.AfterDuration(1200), 1200));
        double[] positions = stepper.profilePositionsM();
        assertEquals(0, positions[0]);
        assertEquals(0.016, positions[positions.length - 1], 1e-15);
        while (stepper.time() < 600) {
            Segment segment = stepper.advance(1200);
            assertArrayEquals(new double[] {segment.start(), segment.end()}, segment.knots(), 0);
            Observation atEnd = segment.at(segment.end());
            assertEquals(stepper.observe(), atEnd, "the interpolant ends on the step's state");
            double mid = 0.5 * (segment.start() + segment.end());
            double[] profile = segment.profileAt(mid);
            Observation o = segment.at(mid);
            double min = Double.POSITIVE_INFINITY;
            double max = Double.NEGATIVE_INFINITY;
            for (double k : profile) {
                min = Math.min(min, k);
                max = Math.max(max, k);
            }
            assertEquals(profile[0], o.surfaceK(), 0, "the surface is the front face of the profile");
            assertEquals(min, o.coldestK(), 0);
            assertEquals(max, o.hottestK(), 0);
        }
    }

    @Test
    void meanRateIsTheDerivativeOfTheMeanWithTemperatureDependentHeatCapacity() {
        // Tabulated c(T): the capacity weights of the mean move with temperature, and the rate must
        // carry that term. Central differences over 1e-3 of a step err by ~1e-6 of the rate.
        ThermalPart part = Parts.plate(SlabEquationsTest.steelTable(), 0.03, 1, 0.8, 20);
        Stepper stepper = new SlabModel().newStepper(part, ComputeBudget.standard());
        stepper.enterStage(Parts.stage("bake", 250, 260, 40, new EndCondition.AfterDuration(2400), 2400));
        while (stepper.time() < 1200) {
            Segment segment = stepper.advance(2400);
            double length = segment.end() - segment.start();
            double t = segment.start() + 0.37 * length;
            double d = 1e-3 * length;
            double numeric = (segment.at(t + d).meanK() - segment.at(t - d).meanK()) / (2 * d);
            assertEquals(numeric, segment.meanRateAt(t), 1e-5 * Math.abs(numeric) + 1e-12, "at " + t);
        }
    }

    @Test
    void aStepEndedInsideItselfReadsAsTheFullStepUpToItsNewEnd() {
        // a cubic is fixed by its values and slopes at two points: the shortened Hermite interpolant
        // is the same cubic on [start, cut]
        ThermalPart part = Parts.plate(Parts.testSolid(), 0.02, 2, 0.9, 20);
        Stepper stepper = new SlabModel().newStepper(part, ComputeBudget.standard());
        stepper.enterStage(Parts.stage("bake", 200, 200, 40, new EndCondition.AfterDuration(600), 600));
        for (int i = 0; i < 6; i++) {
            SlabSegment step = (SlabSegment) stepper.advance(600);
            double cut = step.start() + 0.61 * (step.end() - step.start());
            SlabSegment shortened = step.endingAt(cut);
            assertEquals(cut, shortened.end());
            // rates are differences of ~500 K values over the step: rounding of 1e-13 K over its length
            double rateRounding = 1e-13 * 500 / (cut - step.start());
            for (double f : new double[] {0, 0.2, 0.5, 0.9, 1}) {
                double t = step.start() + f * (cut - step.start());
                assertArrayEquals(step.cellsAt(t), shortened.cellsAt(t), 1e-9, "at " + t);
                assertArrayEquals(step.ratesAt(t), shortened.ratesAt(t), rateRounding, "rates at " + t);
            }
        }
    }

    @Test
    void cuttingMovesTheStateToTheInterpolatedInstant() {
        ThermalPart part = Parts.plate(Parts.testSolid(), 0.02, 2, 0.9, 20);
        Stepper stepper = new SlabModel().newStepper(part, ComputeBudget.standard());
        stepper.enterStage(Parts.stage("bake", 200, 200, 40, new EndCondition.AfterDuration(600), 600));
        Segment segment = stepper.advance(600);
        while (segment.end() - segment.start() < 1) {
            segment = stepper.advance(600);
        }
        double t = segment.start() + 0.4 * (segment.end() - segment.start());
        Observation expected = segment.at(t);
        double[] profile = segment.profileAt(t);
        stepper.cutAt(t);
        assertEquals(t, stepper.time());
        assertEquals(expected, stepper.observe());
        Segment next = stepper.advance(600);
        assertEquals(t, next.start());
        assertArrayEquals(profile, next.profileAt(t), 0);
    }
}
