package dev.dwellwise.job;

/**
 * The service's limits on one job, so that every request is bounded in compute and size.
 *
 * @param maxStages         stages per job
 * @param maxLayers         layers per wall
 * @param maxTablePoints    points per property table
 * @param maxStageSeconds   the longest one stage may last
 * @param maxSpanSeconds    the longest the whole schedule may last (sum of the stage bounds)
 * @param minSampleSeconds  the finest sample spacing
 * @param maxProfiles       profile times per job
 * @param maxSlabCells      finite volumes through the thickness
 */
public record JobLimits(int maxStages, int maxLayers, int maxTablePoints, double maxStageSeconds,
                        double maxSpanSeconds, double minSampleSeconds, int maxProfiles, int maxSlabCells) {

    public static JobLimits standard() {
        return new JobLimits(40, 12, 64, 7 * 86_400, 40 * 86_400, 0.1, 50, 400);
    }
}
