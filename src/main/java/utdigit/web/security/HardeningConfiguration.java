package utdigit.web.security;

import jakarta.servlet.DispatcherType;
import java.time.Duration;
import org.springframework.beans.factory.annotation.Value;
import org.springframework.boot.security.autoconfigure.web.servlet.SecurityFilterProperties;
import org.springframework.boot.tomcat.servlet.TomcatServletWebServerFactory;
import org.springframework.boot.web.server.WebServerFactoryCustomizer;
import org.springframework.boot.web.servlet.FilterRegistrationBean;
import org.springframework.context.annotation.Bean;
import org.springframework.context.annotation.Configuration;
import org.apache.catalina.valves.ErrorReportValve;
import org.springframework.core.Ordered;
import tools.jackson.databind.json.JsonMapper;

/**
 * Registers the protections that sit in front of every feature: the security headers filter
 * first of all filters; after Spring Security (so that a call without a valid token is refused
 * before its body is read) the request body filter and the cap on batches in progress.
 */
@Configuration(proxyBeanMethods = false)
class HardeningConfiguration {

    @Bean
    FilterRegistrationBean<SecurityHeadersFilter> securityHeadersFilter(
            @Value("${springdoc.swagger-ui.path:/swagger-ui.html}") String uiPath) {
        var registration = new FilterRegistrationBean<>(new SecurityHeadersFilter(uiPath));
        registration.setOrder(Ordered.HIGHEST_PRECEDENCE);
        registration.setDispatcherTypes(DispatcherType.REQUEST, DispatcherType.ASYNC, DispatcherType.ERROR);
        registration.setAsyncSupported(true);
        return registration;
    }

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

    /**
     * Tomcat: lets filters close a connection without draining a body they answered early, and
     * answers the container's own refusals as problems. Runs after Boot's customizer, which puts an
     * HTML error report valve on the host; that valve is replaced.
     */
    @Bean
    WebServerFactoryCustomizer<TomcatServletWebServerFactory> tomcatHardening(JsonMapper mapper) {
        return new TomcatHardening(mapper);
    }

    @org.springframework.core.annotation.Order(Ordered.LOWEST_PRECEDENCE)
    record TomcatHardening(JsonMapper mapper) implements WebServerFactoryCustomizer<TomcatServletWebServerFactory>,
            Ordered {
        @Override
        public void customize(TomcatServletWebServerFactory factory) {
            factory.addContextValves(new EarlyClose.TomcatValve());
            factory.addContextCustomizers(context -> {
                var host = context.getParent();
                if (host == null) {
                    return;
                }
                for (var valve : host.getPipeline().getValves()) {
                    if (valve instanceof ErrorReportValve) {
                        host.getPipeline().removeValve(valve);
                    }
                }
                host.getPipeline().addValve(new ProblemReportValve(mapper));
                if (host instanceof org.apache.catalina.core.StandardHost standard) {
                    standard.setErrorReportValveClass(NoErrorReport.class.getName());
                }
            });
        }

        @Override
        public int getOrder() {
            return Ordered.LOWEST_PRECEDENCE;
        }
    }

    /** Stands in for the host's default error report valve: the problem valve does the reporting. */
    public static final class NoErrorReport extends org.apache.catalina.valves.ValveBase {
        public NoErrorReport() {
            super(true);
        }

        @Override
        public void invoke(org.apache.catalina.connector.Request request, org.apache.catalina.connector.Response response)
                throws java.io.IOException, jakarta.servlet.ServletException {
            getNext().invoke(request, response);
        }
    }
}
