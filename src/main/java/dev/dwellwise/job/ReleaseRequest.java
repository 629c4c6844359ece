package dev.dwellwise.job;

/**
 * The MES's question before it releases a batch: does this batch, run by this job, pass?
 *
 * @param batchId the MES's batch identifier, echoed in the answer and the log: 1 to 128 letters,
 *                digits and {@code . _ : / -}
 * @param job     the job the batch ran (or will run)
 */
public record ReleaseRequest(String batchId, Job job) {
}
