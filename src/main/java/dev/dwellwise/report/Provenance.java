package dev.dwellwise.report;

/**
 * Where an answer comes from: the service version, the hash of the canonical job, and the method.
 *
 * @param service      {@code dwellwise <version>}
 * @param inputSha256  SHA-256 of the canonical form of the job (defaults filled, keys sorted)
 * @param solver       the back end's method
 * @param tolerance    the relative tolerance of its error control
 * @param steps        accepted integration steps
 * @param evaluations  right-hand-side evaluations or linear solves
 */
public record Provenance(String service, String inputSha256, String solver, double tolerance, long steps,
                         long evaluations) {
}
