package dev.dwellwise.thermal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * What both steppers promise the runner around settling: a segment ends where the stepper's clock
 * and state are, also when its last step was cut at the band entry, and the call after that cut
 * settles.
 */
class SettlingTest {

    private static final double AIR_K = Physics.toKelvin(200);

    @Test
    void everyLumpedSegmentEndsWhereTheStepperStands() {
        Stepper stepper = new LumpedModel().newStepper(Parts.plate(Parts.steel1010(), 0.002, 2, 0, 20),
                ComputeBudget.standard());
        assertSegmentsEndWhereTheStepperStands(stepper);
    }

    @Test
    void everySlabSegmentEndsWhereTheStepperStands() {
        Stepper stepper = new SlabModel().newStepper(Parts.plate(Parts.testSolid(), 0.01, 1, 0, 20),
                ComputeBudget.standard());
        assertSegmentsEndWhereTheStepperStands(stepper);
    }

    /** To a condition at the air temperature: the last integrated segment is cut at the band entry. */
    private static void assertSegmentsEndWhereTheStepperStands(Stepper stepper) {
        stepper.enterStage(Parts.stage("oven", 200, 200, 30, new EndCondition.ColdestReaches(AIR_K), 20_000));
        boolean settled = false;
        while (stepper.time() < 20_000) {
            Segment segment = stepper.advance(20_000, o -> o.coldestK() - AIR_K);
            double[] knots = segment.knots();
            assertEquals(segment.end(), knots[knots.length - 1], 0, "the last knot is the end");
            assertEquals(stepper.time(), segment.end(), 0, "the segment ends on the stepper's clock");
            Observation held = stepper.observe();
            Observation read = segment.at(segment.end());
            // a settled slab's mean is a weighted sum of equal cells: a rounding unit off the cells
            assertEquals(held.meanK(), read.meanK(), 1e-12 * held.meanK(), "the segment ends on the stepper's state");
            assertEquals(held.coldestK(), read.coldestK(), 0, "the segment ends on the stepper's state");
            assertEquals(held.hottestK(), read.hottestK(), 0, "the segment ends on the stepper's state");
            settled |= segment instanceof SettledSegment;
        }
        assertTrue(settled, "the part settled at the air temperature");
    }

    @Test
    void aSlabInAnInsulatedDwellSettlesRightAfterTheStepThatEnteredTheBand() {
        // no heat exchanged (h = 0, emissivity 0): the steady temperature is the slab's mean, computed
        // again at every call; a rounding unit of difference must not cost another step
        ThermalPart block = new ThermalPart(List.of(new Layer(Parts.steel1010(), 0.06)), 1, 0, Physics.toKelvin(20));
        Stepper stepper = new SlabModel().newStepper(block, ComputeBudget.standard());
        stepper.enterStage(Parts.stage("heat", 400, 400, 200, new EndCondition.AfterDuration(120), 120));
        while (stepper.time() < 120) {
            stepper.advance(120, StopSignal.NONE);
        }
        stepper.enterStage(Parts.stage("insulated dwell", 400, 400, 0, new EndCondition.AfterDuration(5000), 5000));
        Segment previous = null;
        Segment segment = stepper.advance(5120, StopSignal.NONE);
        while (!(segment instanceof SettledSegment)) {
            previous = segment;
            segment = stepper.advance(5120, StopSignal.NONE);
        }
        assertTrue(previous.end() - previous.start() > 1e-3, "the step before settling spans only "
                + (previous.end() - previous.start()) + " s: the call after the band entry did not settle");
    }
}
