/**
 * The job as the client sends it: immutable records that are also the wire format (v1, camelCase,
 * the unit at the end of every quantity's name), their defaults, and their validation.
 *
 * <p>Jackson binds the records; {@link dev.dwellwise.job.JobValidator} then checks every value and
 * names each offending field by its path ({@code stages[2].until}); {@link
 * dev.dwellwise.job.ProblemBuilder} turns a valid job into a {@link
 * dev.dwellwise.thermal.ThermalProblem} in SI units. Nothing here knows of HTTP.
 */
package dev.dwellwise.job;
