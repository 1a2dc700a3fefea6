package utdigit.web.limits;

import jakarta.servlet.DispatcherType;
import java.time.Duration;
import org.springframework.beans.factory.annotation.Value;
import org.springframework.boot.security.autoconfigure.web.servlet.SecurityFilterProperties;
import org.springframework.boot.tomcat.servlet.TomcatServletWebServerFactory;
import org.springframework.boot.web.server.WebServerFactoryCustomizer;
import org.springframework.boot.web.servlet.FilterRegistrationBean;
import org.springframework.context.annotation.Bean;
import org.springframework.context.annotation.Configuration;

/**
 * Registers the HTTP limits that sit in front of every feature, after Spring Security when it is
 * installed (so that a call without a valid token is refused before its body is read): the request
 * body filter and the cap on batches in progress.
 */
@Configuration(proxyBeanMethods = false)
class HttpLimitsConfiguration {

    @Bean
    FilterRegistrationBean<RequestBodyFilter> requestBodyFilter(
            @Value("${utdigit.json.max-body-bytes:1048576}") long maxBodyBytes,
            @Value("${utdigit.http.body-read-timeout:10s}") Duration readTimeout,
            ProblemResponses problems) {
        if (maxBodyBytes < 1 || readTimeout.isNegative() || readTimeout.isZero()) {
            throw new IllegalArgumentException("utdigit.json.max-body-bytes must be >= 1 and "
                    + "utdigit.http.body-read-timeout > 0 (got " + maxBodyBytes + ", " + readTimeout + ")");
        }
        var registration = new FilterRegistrationBean<>(new RequestBodyFilter(maxBodyBytes, readTimeout, problems));
        registration.setOrder(SecurityFilterProperties.DEFAULT_FILTER_ORDER + 10);
        registration.setDispatcherTypes(DispatcherType.REQUEST, DispatcherType.ASYNC);
        registration.setAsyncSupported(true);
        return registration;
    }

    @Bean
    FilterRegistrationBean<BatchConcurrencyFilter> batchConcurrencyFilter(
            @Value("${utdigit.http.max-concurrent-batches:16}") int maxBatches, ProblemResponses problems) {
        if (maxBatches < 1) {
            throw new IllegalArgumentException("utdigit.http.max-concurrent-batches must be >= 1 (got " + maxBatches + ")");
        }
        var registration = new FilterRegistrationBean<>(new BatchConcurrencyFilter(maxBatches, problems));
        registration.setOrder(SecurityFilterProperties.DEFAULT_FILTER_ORDER + 11);
        registration.setDispatcherTypes(DispatcherType.REQUEST);
        return registration;
    }

    /** Tomcat: lets filters close a connection without draining a body they answered early. */
    @Bean
    WebServerFactoryCustomizer<TomcatServletWebServerFactory> earlyCloseValve() {
        return factory -> factory.addContextValves(new EarlyClose.TomcatValve());
    }
}
