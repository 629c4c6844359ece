package dev.dwellwise.http;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;

/** The rule both rate guards apply: the grace period, or longer at the rate. */
class MinimumRateTest {

    private final MinimumRate rate = new MinimumRate(4096, 2000);

    @Test
    void aTransferTooSmallToShowTheRateGetsTheGracePeriod() {
        assertEquals(TimeUnit.SECONDS.toNanos(2), rate.allowedNanos(0));
        assertEquals(TimeUnit.SECONDS.toNanos(2), rate.allowedNanos(8192)); // 2 s at the rate: either way
    }

    @Test
    void aLargerTransferGetsTheTimeTheRateNeeds() {
        assertEquals(TimeUnit.SECONDS.toNanos(256), rate.allowedNanos(1024 * 1024));
        assertEquals(TimeUnit.MILLISECONDS.toNanos(2250), rate.allowedNanos(9216));
    }

    @Test
    void aRateMustBePositive() {
        assertThrows(IllegalArgumentException.class, () -> new MinimumRate(0, 2000));
        assertThrows(IllegalArgumentException.class, () -> new MinimumRate(4096, -1));
    }
}
