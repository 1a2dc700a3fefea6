package utdigit.web.problem;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import org.apache.catalina.connector.ClientAbortException;
import org.junit.jupiter.api.Test;
import org.springframework.web.context.request.async.AsyncRequestNotUsableException;
import tools.jackson.core.exc.JacksonIOException;

/**
 * A client that closes its connection while a (batch) answer streams is not a failure of the
 * service: recognised through the wrappers that Jackson and Spring put around the socket's error.
 */
class ClientWentAwayTest {

    @Test
    void aResetOrBrokenConnectionUnderAnyWrapperIsTheClientGoingAway() {
        // what a CSV batch cut off by the caller throws (seen in the service log)
        assertThat(ProblemAdvice.clientWentAway(JacksonIOException.construct(
                new IOException("Connection reset by peer")))).isTrue();
        assertThat(ProblemAdvice.clientWentAway(new RuntimeException(new IOException("Broken pipe")))).isTrue();
        assertThat(ProblemAdvice.clientWentAway(new ClientAbortException(new IOException("x")))).isTrue();
        assertThat(ProblemAdvice.clientWentAway(new AsyncRequestNotUsableException("response not usable"))).isTrue();
    }

    @Test
    void otherFailuresAreNot() {
        assertThat(ProblemAdvice.clientWentAway(new IllegalStateException("bug"))).isFalse();
        assertThat(ProblemAdvice.clientWentAway(new IOException("No space left on device"))).isFalse();
        assertThat(ProblemAdvice.clientWentAway(new RuntimeException((Throwable) null))).isFalse();
    }
}
