/**
 * Cure metrics and kinetics along a computed temperature history: whether a coating reached its
 * cure condition and stayed inside its cure window.
 *
 * <p>Every calculation takes a {@link dev.dwellwise.cure.TemperaturePath}, a function of time
 * that is smooth between knots (for a computed history: its coldest or its hottest point), and
 * works piece by piece between the knots. Units are SI throughout: kelvin, seconds, J/mol, 1/s;
 * R = 8.314462618 J/(mol·K) ({@link dev.dwellwise.cure.Arrhenius#GAS_CONSTANT}).
 * <ul>
 * <li>{@link dev.dwellwise.cure.TimeAbove}: the time with T(t) ≥ T_c, crossings by Brent root
 * finding;</li>
 * <li>{@link dev.dwellwise.cure.EquivalentTime}: t_eq = ∫ exp[(E/R)(1/T_ref − 1/T)] dt, the
 * equivalent-age form of ASTM C1074, by Gauss–Legendre quadrature;</li>
 * <li>{@link dev.dwellwise.cure.DegreeOfCure}: d(alpha)/dt = A e^(−E/RT) (1 − alpha)^n (nth order)
 * or (k1 + k2 alpha^m)(1 − alpha)^n with k_i = A_i e^(−E_i/RT) (Kamal–Sourour), by adaptive
 * Dormand–Prince 8(5,3) integration;</li>
 * <li>{@link dev.dwellwise.cure.GlassTransitionSpec}: DiBenedetto, (Tg − Tg0)/(Tg∞ − Tg0) =
 * λ alpha / [1 − (1 − λ) alpha].</li>
 * </ul>
 * {@link dev.dwellwise.cure.CureAnalysis} gathers the figures a {@link dev.dwellwise.cure.CureSpec}
 * asks for at the coldest and the hottest point; {@link dev.dwellwise.cure.HoldEstimate} turns a
 * shortfall into seconds of further hold. Each figure's work is bounded by a
 * {@link dev.dwellwise.cure.CureBudget}; past it a {@link dev.dwellwise.cure.CureComputationException}
 * is thrown. Judging the figures against the spec (the checks) belongs to the report.
 *
 * <p>This package depends on {@code dev.dwellwise.thermal} and Commons Math only: it knows nothing
 * of HTTP or JSON and imports neither Javalin nor Jackson.
 */
package dev.dwellwise.cure;
