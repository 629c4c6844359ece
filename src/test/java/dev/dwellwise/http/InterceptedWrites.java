package dev.dwellwise.http;

import java.nio.ByteBuffer;
import java.util.function.BiFunction;
import org.eclipse.jetty.server.Handler;
import org.eclipse.jetty.server.Request;
import org.eclipse.jetty.server.Response;
import org.eclipse.jetty.util.Callback;

/**
 * A test handler through which every answer's writes pass on their way to Jetty: put outside the
 * handlers under test, it plays the server's stalls and a socket's late completions.
 */
final class InterceptedWrites extends Handler.Wrapper {

    /** One write of an answer, as {@link Response#write} takes it. */
    @FunctionalInterface
    interface Write {
        void write(boolean last, ByteBuffer content, Callback written);
    }

    /** Given a request and the write that goes on to Jetty, the write its answer makes instead. */
    private final BiFunction<Request, Write, Write> perAnswer;

    InterceptedWrites(BiFunction<Request, Write, Write> perAnswer) {
        this.perAnswer = perAnswer;
    }

    @Override
    public boolean handle(Request request, Response response, Callback callback) throws Exception {
        Response.Wrapper onward = new Response.Wrapper(request, response);
        Write intercepted = perAnswer.apply(request, onward::write);
        return super.handle(request, new Response.Wrapper(request, response) {
            @Override
            public void write(boolean last, ByteBuffer content, Callback written) {
                intercepted.write(last, content, written);
            }
        }, callback);
    }

    /** Holds the calling thread, as a descheduled one would be held. */
    static void stall(long millis) {
        try {
            Thread.sleep(millis);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }
}
