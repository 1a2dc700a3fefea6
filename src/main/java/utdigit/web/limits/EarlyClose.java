package utdigit.web.limits;

import jakarta.servlet.ServletException;
import jakarta.servlet.http.HttpServletRequest;
import java.io.IOException;
import org.apache.catalina.connector.Request;
import org.apache.catalina.connector.Response;
import org.apache.catalina.valves.ValveBase;
import org.apache.coyote.ActionCode;

/**
 * Closing a connection after an early answer without draining the request body. When the service
 * answers before it has read a body (413 by Content-Length, 408 after the read deadline, 401 without
 * a valid token), Tomcat by default reads and discards the rest of the body on a worker thread
 * ("swallowing", up to server.tomcat.max-swallow-size), so a client that trickles its body would
 * keep that thread however early it was answered. The valve puts a hook on every request; the hook
 * tells Tomcat not to swallow and to close the connection once the answer is written.
 */
// server.tomcat.max-swallow-size cannot replace it: Tomcat still waits for and reads one more chunk of
// the body before it gives up (Tomcat 11.0.22 IdentityInputFilter.end reads, then checks the size);
// SlowClientsTest and BodyLimitsTest (raw sockets) check the early close.
final class EarlyClose {
    static final String HOOK = EarlyClose.class.getName() + ".HOOK";

    private EarlyClose() {}

    /** Asks the container to close the connection after the answer without reading the body. */
    static void closeAfterAnswer(HttpServletRequest request) {
        if (request.getAttribute(HOOK) instanceof Runnable hook) {
            hook.run();
        }
    }

    /** The Tomcat side: installs the hook on each request. */
    static final class TomcatValve extends ValveBase {
        TomcatValve() {
            super(true);
        }

        @Override
        public void invoke(Request request, Response response) throws IOException, ServletException {
            request.setAttribute(HOOK, (Runnable) () -> {
                // DISABLE_SWALLOW_INPUT marks the connection CLOSE_CLEAN: the answer is written, then
                // the socket is closed. It also flags the answer as an error; mark it reported so the
                // container does not render an error page over the problem already written.
                request.getCoyoteRequest().action(ActionCode.DISABLE_SWALLOW_INPUT, null);
                response.getCoyoteResponse().setErrorReported();
            });
            getNext().invoke(request, response);
        }
    }
}
