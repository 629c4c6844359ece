package dev.dwellwise.http;

import java.nio.ByteBuffer;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;
import org.eclipse.jetty.io.EndPoint;
import org.eclipse.jetty.server.Handler;
import org.eclipse.jetty.server.Request;
import org.eclipse.jetty.server.Response;
import org.eclipse.jetty.util.Callback;
import org.eclipse.jetty.util.thread.Scheduler;

/**
 * Cuts off an answer that its client reads too slowly, by closing the connection: the time the
 * answer's writes have waited for the client must stay within what {@link MinimumRate} allows for
 * the bytes handed to them. A blocked write holds its HTTP thread (not a worker or admission place),
 * and the idle timeout alone would let a client that reads a few bytes in every timeout hold it for
 * as long as a large series lasts; enough such clients would leave no thread for the probes.
 *
 * <p>Only waiting counts, from when the call that started a write has returned: a write that the
 * socket takes at once (every answer that fits the connection's buffers, whatever the client does)
 * arms nothing, and the server's own time inside and between writes (a descheduled thread, a
 * collection, a cold JVM) is never held against the client. That is what Jetty's
 * {@code MinimumDataRateHandler} got wrong for answers: it gave a one-write answer length/rate to
 * finish from the moment of writing, 4.4 ms for a probe's 18 bytes, and cut the body off a first
 * readiness answer on a loaded machine ({@code SlowWritesTest}).
 */
final class AnswerRateGuard extends Handler.Wrapper {

    private final MinimumRate rate;

    AnswerRateGuard(MinimumRate rate) {
        this.rate = rate;
    }

    @Override
    public boolean handle(Request request, Response response, Callback callback) throws Exception {
        return super.handle(request, new GuardedAnswer(request, response), callback);
    }

    /** Jetty allows one write at a time per answer: the next starts after the last one completed. */
    private final class GuardedAnswer extends Response.Wrapper {

        /** Taken while the request is live: the timers run on the scheduler's thread. */
        private final Scheduler scheduler;
        private final EndPoint endPoint;
        private long bytesHanded;
        /** Time the completed writes waited on the client; written where a write completes, maybe another thread. */
        private volatile long waitedNanos;

        GuardedAnswer(Request request, Response response) {
            super(request, response);
            this.scheduler = request.getComponents().getScheduler();
            this.endPoint = request.getConnectionMetaData().getConnection().getEndPoint();
        }

        @Override
        public void write(boolean last, ByteBuffer content, Callback callback) {
            bytesHanded += content == null ? 0 : content.remaining();
            WatchedWrite write = new WatchedWrite(callback);
            super.write(last, content, write);
            write.watchUnlessDone(rate.allowedNanos(bytesHanded) - waitedNanos);
        }

        /**
         * A write's callback that, while the write waits on the client, has a timer that cuts it off.
         * The write's completion and the timer settle it once, whichever comes first; a write that
         * completes after the timer has closed the connection is reported failed, so that the answer
         * is never taken for delivered and the closed connection never serves another request.
         */
        private final class WatchedWrite extends Callback.Nested {

            /** Whether, and since when, the write has waited: from when the call that started it returned. */
            private boolean waiting;
            private long waitingSince;
            private boolean settled;
            private Scheduler.Task timer;
            private TimeoutException cutOff;

            WatchedWrite(Callback callback) {
                super(callback);
            }

            void watchUnlessDone(long allowedNanos) {
                synchronized (this) {
                    if (settled) {
                        return; // taken at once: the usual case, and the only one for a small answer
                    }
                    // waiting starts now: the server's own time inside the call (a collection, a
                    // descheduled thread, a first write's class loading) is not the client's
                    waiting = true;
                    waitingSince = System.nanoTime();
                }
                // scheduled outside the lock, which a completion on a selector thread may be waiting for
                Scheduler.Task set = scheduler.schedule(this::cutOffIfWaiting, Math.max(0, allowedNanos),
                        TimeUnit.NANOSECONDS);
                boolean settledMeanwhile;
                synchronized (this) {
                    timer = set;
                    settledMeanwhile = settled;
                }
                if (settledMeanwhile) {
                    set.cancel(); // completed (or cut off) while the timer was being set
                }
            }

            private void cutOffIfWaiting() {
                TimeoutException cut;
                synchronized (this) {
                    if (settled) {
                        return;
                    }
                    settled = true;
                    cut = cutOff = new TimeoutException("the client read the answer slower than "
                            + rate.bytesPerSecond() + " bytes a second");
                }
                endPoint.close(cut); // fails the waiting write, and through it the answer: logged as 499
            }

            /** Settles the write as completed; returns the cut-off instead when the timer came first. */
            private TimeoutException finish() {
                Scheduler.Task set;
                synchronized (this) {
                    if (waiting) {
                        waitedNanos += System.nanoTime() - waitingSince; // one write at a time: no lost update
                    }
                    if (settled) {
                        return cutOff;
                    }
                    settled = true;
                    set = timer;
                }
                if (set != null) {
                    set.cancel();
                }
                return null;
            }

            @Override
            public void succeeded() {
                TimeoutException cut = finish();
                if (cut == null) {
                    super.succeeded();
                } else {
                    endPoint.close(cut); // closed before the failure is told, whichever thread gets there first
                    super.failed(cut);
                }
            }

            @Override
            public void failed(Throwable failure) {
                finish();
                super.failed(failure);
            }
        }
    }
}
