/**
 * The physics of a part travelling through oven and cooling stages, and the back ends that compute
 * its temperature history.
 *
 * <p>A {@link dev.dwellwise.thermal.ThermalProblem} (SI units, kelvin) is solved by a
 * {@link dev.dwellwise.thermal.ThermalModel}: each back end supplies a {@link
 * dev.dwellwise.thermal.Stepper} that advances its own state with error control and returns dense
 * {@link dev.dwellwise.thermal.Segment}s; the shared {@link dev.dwellwise.thermal.StageRunner}
 * turns those into stage ends (events located by root finding on the dense output), samples and
 * per-stage figures. The equations, the integrator, the events and the sampling each live in their
 * own small type, as in Commons Math's {@code ode} package.
 *
 * <p>Two back ends: {@link dev.dwellwise.thermal.LumpedModel} (one temperature, Dormand–Prince 5(4)
 * for one equation) and {@link dev.dwellwise.thermal.SlabModel} (through-thickness conduction: finite
 * volumes on a {@code SlabGrid}, the semi-discrete equations in
 * {@code SlabEquations}, TR-BDF2 steps in {@code TrBdf2}
 * under the step control of {@code SlabStepper}, dense output in
 * {@code SlabSegment}).
 *
 * <p>This package knows nothing of HTTP or JSON: it imports neither Javalin nor Jackson (an
 * architecture test keeps it so).
 */
package dev.dwellwise.thermal;
