package dev.dwellwise.http;

import java.util.concurrent.TimeUnit;

/**
 * The slowest a client may move a body or an answer: once a transfer has taken longer than the grace
 * period, it must have averaged at least {@code bytesPerSecond}. The grace period lets a small
 * transfer pause (a retransmission, a delayed acknowledgement, a stall of the client's own) without
 * being judged on a rate it never had the bytes to show.
 */
record MinimumRate(long bytesPerSecond, long graceMillis) {

    MinimumRate {
        if (bytesPerSecond <= 0 || graceMillis < 0) {
            throw new IllegalArgumentException("a minimum rate needs a positive rate and a grace period of 0 or more");
        }
    }

    /** How long a transfer of this many bytes may take: the grace period, or longer at the rate. */
    long allowedNanos(long bytes) {
        return Math.max(TimeUnit.MILLISECONDS.toNanos(graceMillis),
                (long) (bytes * (double) TimeUnit.SECONDS.toNanos(1) / bytesPerSecond));
    }
}
