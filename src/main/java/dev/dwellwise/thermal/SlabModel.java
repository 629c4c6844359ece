package dev.dwellwise.thermal;

/**
 * The through-thickness back end: 1-D transient conduction across the layers of the part (front face
 * first, in perfect contact), in SI units and kelvin,
 * <pre>  rho c(T) ∂T/∂t = ∂/∂x (k(T) ∂T/∂x)
 *  into an exposed face:  q(T_s) = h (T_air(t) − T_s) + eps sigma (T_sur(t)⁴ − T_s⁴)
 *  insulated back face (one exposed face): no flux</pre>
 * with both faces under the same stage when two are exposed, and air and surroundings that may ramp
 * with the time since the stage started.
 *
 * <ul>
 *   <li><b>Space</b> ({@code SlabGrid}, {@code SlabEquations}): cell-centred finite volumes, graded
 *   toward the exposed faces; harmonic-mean conductances between cells (Patankar 1980); the face
 *   temperature from the face balance through the half cell; conservation form d E_i(T_i)/dt =
 *   fluxes, E_i the cell's enthalpy, so tabulated c(T) conserves heat. A symmetric wall with two
 *   exposed faces is computed on its front half. Second order.</li>
 *   <li><b>Time</b> ({@code TrBdf2}, {@code SlabStepper}): TR-BDF2 (Bank et al., IEEE Trans. CAD 4
 *   (1985) 436–451), L-stable and second order, with the embedded third-order estimate of Hosea and
 *   Shampine (Appl. Numer. Math. 20 (1996) 21–37) driving the step size; each stage solved by Newton's
 *   method with the exact tridiagonal Jacobian (radiation, k(T) and c(T) included, nothing lagged),
 *   Thomas algorithm ({@code Tridiagonal}).</li>
 *   <li><b>Output</b> ({@code SlabSegment}, {@code SlabReadout}): per step a cubic Hermite interpolant
 *   of every cell; the mean is capacity-weighted, the surface is the front face, the core the
 *   mid-plane (two faces) or the back face (one), the coldest and hottest points are taken over the
 *   faces and cell centres.</li>
 * </ul>
 * State: the cell temperatures, kelvin, front to back. Cost: per step about five tridiagonal solves
 * and seven flux evaluations over the cells (O(cells) each); a one-hour bake-and-cool job takes a few
 * hundred to a thousand steps at the default resolution ({@link SlabResolution#standard()}).
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
    public Stepper newStepper(ThermalPart part, ComputeBudget budget, Deadline deadline) {
        // the slab's calls are short (one accepted step each); StageRunner checks the deadline between them
        return new SlabStepper(part, SlabGrid.of(part, resolution.cells()), resolution.relativeTolerance(), budget);
    }
}
