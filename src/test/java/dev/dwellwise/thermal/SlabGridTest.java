package dev.dwellwise.thermal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

/** The finite-volume grid: layout invariants that the equations and the readout rely on. */
class SlabGridTest {

    private static final Material STEEL = Parts.steel1010();
    private static final Material COAT = Material.constant("coat", "invented coating", 1400, 1200, 0.2, "invented");

    @Test
    void oneExposedFaceIsGradedFromFineAtTheFrontToCoarseAtTheInsulatedBack() {
        SlabGrid grid = SlabGrid.of(Parts.plate(STEEL, 0.01, 1, 0.9, 20), 40);
        assertEquals(SlabGrid.BackFace.INSULATED, grid.back());
        assertEquals(40, grid.cells());
        assertEquals(0.01, grid.spanM(), 1e-15);
        double ratio = grid.widthM(39) / grid.widthM(0);
        // (1 + beta)/(1 - beta) at the continuous limit, the cells sampling it at their midpoints
        assertEquals((1 + SlabGrid.GRADING) / (1 - SlabGrid.GRADING), ratio, 0.02);
        for (int i = 1; i < 40; i++) {
            assertTrue(grid.widthM(i) > grid.widthM(i - 1), "widths grow toward the back");
        }
    }

    @Test
    void aSymmetricWallExposedOnBothFacesIsComputedOnItsFrontHalfAndMirrored() {
        SlabGrid grid = SlabGrid.of(new ThermalPart(List.of(new Layer(COAT, 0.0005), new Layer(STEEL, 0.006),
                new Layer(COAT, 0.0005)), 2, 0.9, 293.15), 40);
        assertEquals(SlabGrid.BackFace.MID_PLANE, grid.back());
        assertEquals(0.0035, grid.spanM(), 1e-15);
        assertEquals(40, grid.cells());
        double[] faces = grid.facesM();
        assertTrue(contains(faces, 0.0005), "the coating interface is a cell face");
        assertSame(COAT, grid.material(0));
        assertSame(STEEL, grid.material(39));
        double[] positions = grid.profilePositionsM();
        assertEquals(2 * 40 + 3, positions.length);
        assertEquals(0, positions[0]);
        assertEquals(0.0035, positions[41], 1e-15);
        assertEquals(0.007, positions[82], 1e-15);
        assertEquals(0.007 - positions[1], positions[81], 1e-15);
    }

    @Test
    void anAsymmetricWallExposedOnBothFacesHasTwiceTheCellsAndAMidPlaneFace() {
        SlabGrid grid = SlabGrid.of(new ThermalPart(List.of(new Layer(COAT, 0.001), new Layer(STEEL, 0.006)),
                2, 0.9, 293.15), 20);
        assertEquals(SlabGrid.BackFace.EXPOSED, grid.back());
        assertEquals(40, grid.cells());
        assertEquals(0.0035, grid.facesM()[grid.midPlaneFace()], 1e-15);
        assertTrue(contains(grid.facesM(), 0.001));
        assertTrue(grid.widthM(39) < grid.widthM(grid.midPlaneFace()), "fine at the exposed back face too");
        double sum = 0;
        for (int i = 0; i < grid.cells(); i++) {
            assertTrue(grid.widthM(i) > 0);
            assertSame(grid.centreM(i) < 0.001 ? COAT : STEEL, grid.material(i));
            sum += grid.widthM(i);
        }
        assertEquals(0.007, sum, 1e-15);
    }

    @Test
    void aLayerThinnerThanItsShareStillGetsACell() {
        SlabGrid grid = SlabGrid.of(new ThermalPart(List.of(new Layer(COAT, 0.00002), new Layer(STEEL, 0.01)),
                1, 0.9, 293.15), 10);
        assertEquals(10, grid.cells());
        assertSame(COAT, grid.material(0));
        assertEquals(0.00002, grid.widthM(0), 1e-18);
        assertSame(STEEL, grid.material(1));
    }

    private static boolean contains(double[] values, double x) {
        for (double v : values) {
            if (Math.abs(v - x) < 1e-15) {
                return true;
            }
        }
        return false;
    }
}
