package dev.dwellwise.http;

import java.util.concurrent.TimeoutException;
import org.eclipse.jetty.io.Content;
import org.eclipse.jetty.server.Handler;
import org.eclipse.jetty.server.Request;
import org.eclipse.jetty.server.Response;
import org.eclipse.jetty.util.Callback;

/**
 * Cuts off a request body that trickles in: once it has been arriving for a grace period, it must
 * have averaged a minimum rate. Checked when the reader has to wait for more of the body, so neither
 * a pause of the server's own (a collection, a descheduled thread) nor a body that has fully arrived
 * counts against it. Jetty's two checks of the kind give a small body next to no allowance: the
 * servlet input's refused a 492-byte job after a 0.2 s pause in its arrival, and after a 0.15 s pause
 * of the reader's own with all of it in hand; {@code MinimumDataRateHandler} allows one pause, and
 * wraps every request and answer in counters.
 */
final class BodyRateGuard extends Handler.Wrapper {

    private final MinimumRate rate;

    BodyRateGuard(MinimumRate rate) {
        this.rate = rate;
    }

    @Override
    public boolean handle(Request request, Response response, Callback callback) throws Exception {
        // a request without a body (a probe, a scrape) is passed on as it is
        return super.handle(request.getLength() == 0 ? request : new GuardedBody(request), response, callback);
    }

    /** Jetty calls demand and read one at a time for a request, never at once. */
    private final class GuardedBody extends Request.Wrapper {

        private long firstDemand;
        private boolean demanded;
        private long bytesRead;
        private Content.Chunk refusal;

        GuardedBody(Request request) {
            super(request);
        }

        @Override
        public void demand(Runnable demandCallback) {
            long now = System.nanoTime();
            if (!demanded) {
                demanded = true;
                firstDemand = now;
            } else if (now - firstDemand > rate.allowedNanos(bytesRead)) {
                refusal = Content.Chunk.from(new TimeoutException("the body came slower than "
                        + rate.bytesPerSecond() + " bytes a second"), true);
                demandCallback.run();
                return;
            }
            super.demand(demandCallback);
        }

        @Override
        public Content.Chunk read() {
            if (refusal != null) {
                return refusal;
            }
            Content.Chunk chunk = super.read();
            if (chunk != null) {
                bytesRead += chunk.remaining();
            }
            return chunk;
        }
    }
}
