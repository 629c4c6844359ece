package dev.dwellwise.http;

import java.nio.ByteBuffer;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;
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
 * <p>Only waiting counts: a write that the socket takes at once (every answer that fits the
 * connection's buffers, whatever the client does) arms nothing, and the server's own time between
 * writes (a descheduled thread, a collection, a cold JVM) is never held against the client. That is
 * what Jetty's {@code MinimumDataRateHandler} got wrong for answers: it gave a one-write answer
 * length/rate to finish from the moment of writing, 4.4 ms for a probe's 18 bytes, and cut the body off
 * a first readiness answer on a loaded machine ({@code SlowWritesTest}).
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

        private long bytesHanded;
        /** Time the completed writes waited; written where a write completes, maybe another thread. */
        private volatile long waitedNanos;

        GuardedAnswer(Request request, Response response) {
            super(request, response);
        }

        @Override
        public void write(boolean last, ByteBuffer content, Callback callback) {
            bytesHanded += content == null ? 0 : content.remaining();
            WatchedWrite write = new WatchedWrite(callback);
            super.write(last, content, write);
            write.watchUnlessDone(rate.allowedNanos(bytesHanded) - waitedNanos);
        }

        /** A write's callback that, while the write waits on the client, has a timer that cuts it off. */
        private final class WatchedWrite extends Callback.Nested {

            private final long started = System.nanoTime();
            private volatile boolean done;
            private volatile Scheduler.Task timer;

            WatchedWrite(Callback callback) {
                super(callback);
            }

            void watchUnlessDone(long allowedNanos) {
                if (done) {
                    return; // taken at once: the usual case, and the only one for a small answer
                }
                long left = Math.max(0, allowedNanos - (System.nanoTime() - started));
                Scheduler scheduler = getRequest().getComponents().getScheduler();
                timer = scheduler.schedule(this::cutOffIfWaiting, left, TimeUnit.NANOSECONDS);
                if (done) {
                    timer.cancel(); // completed while the timer was being set
                }
            }

            private void cutOffIfWaiting() {
                if (!done) {
                    // fails the waiting write, and through it the answer: the access line says 499
                    getRequest().getConnectionMetaData().getConnection().getEndPoint().close(new TimeoutException(
                            "the client read the answer slower than " + rate.bytesPerSecond() + " bytes a second"));
                }
            }

            private void finish() {
                waitedNanos += System.nanoTime() - started; // one write at a time: no lost update
                done = true;
                Scheduler.Task set = timer;
                if (set != null) {
                    set.cancel();
                }
            }

            @Override
            public void succeeded() {
                finish();
                super.succeeded();
            }

            @Override
            public void failed(Throwable failure) {
                finish();
                super.failed(failure);
            }
        }
    }
}
