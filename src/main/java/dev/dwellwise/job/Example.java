package dev.dwellwise.job;

/** A bundled example: an invented plant scenario with a job that simulates as it is. */
public record Example(String id, String title, String description, Job job) {
}
