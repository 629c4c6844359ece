package dev.dwellwise.thermal;

/**
 * The through-thickness back end: 1-D transient conduction across the layers of the part, front
 * face first, in perfect contact,
 * <pre>  rho c(T) dT/dt = d/dx (k(T) dT/dx),   −k dT/dx = q(T_s) at an exposed face, 0 at an insulated back face,
 *  q(T_s) = h (T_air(t) − T_s) + eps sigma (T_sur(t)⁴ − T_s⁴)</pre>
 * (SI units, kelvin). With two exposed faces both see the same stage. Space: finite volumes on a
 * {@link SlabGrid} (cells graded toward the exposed faces; see {@link SlabEquations}). Time: TR-BDF2
 * with an embedded error estimate and step control ({@link TrBdf2}, {@link SlabStepper}), Newton
 * with the exact tridiagonal Jacobian on the nonlinear boundary and properties. State: the cell
 * temperatures, kelvin. Cost: about five tridiagonal solves of the cell count per step.
 */
public final class SlabModel implements ThermalModel {

    private final SlabResolution resolution;

    /** The default resolution, {@link SlabResolution#standard()}. */
    public SlabModel() {
        this(SlabResolution.standard());
    }

    public SlabModel(int cells) {
        this(SlabResolution.standard().withCells(cells));
    }

    public SlabModel(SlabResolution resolution) {
        this.resolution = resolution;
    }

    public SlabResolution resolution() {
        return resolution;
    }

    @Override
    public String name() {
        return "slab";
    }

    @Override
    public String method() {
        return "1-D finite-volume conduction, " + resolution.cells() + " cells per conduction length graded toward "
                + "the exposed faces; "
                + "TR-BDF2 (Bank et al. 1985; Hosea and Shampine 1996) with embedded error estimate and "
                + "step control; Newton with tridiagonal Jacobian for radiation and tabulated properties";
    }

    @Override
    public double tolerance() {
        return resolution.relativeTolerance();
    }

    @Override
    public Stepper newStepper(ThermalPart part, ComputeBudget budget) {
        return new SlabStepper(part, SlabGrid.of(part, resolution.cells()), resolution.relativeTolerance(), budget);
    }
}
