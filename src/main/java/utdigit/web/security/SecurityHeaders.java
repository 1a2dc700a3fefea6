package utdigit.web.security;

import jakarta.servlet.DispatcherType;
import jakarta.servlet.ServletException;
import java.io.IOException;
import org.apache.catalina.connector.Request;
import org.apache.catalina.connector.Response;
import org.apache.catalina.core.StandardHost;
import org.apache.catalina.valves.ErrorReportValve;
import org.apache.catalina.valves.ValveBase;
import org.springframework.boot.tomcat.servlet.TomcatServletWebServerFactory;
import org.springframework.boot.web.server.WebServerFactoryCustomizer;
import tools.jackson.databind.json.JsonMapper;
import jakarta.servlet.http.HttpServletRequest;
import java.util.List;
import org.springframework.beans.factory.annotation.Value;
import org.springframework.boot.web.servlet.FilterRegistrationBean;
import org.springframework.context.annotation.Bean;
import org.springframework.context.annotation.Configuration;
import org.springframework.core.Ordered;
import org.springframework.security.web.header.HeaderWriter;
import org.springframework.security.web.header.HeaderWriterFilter;
import org.springframework.security.web.header.writers.CompositeHeaderWriter;
import org.springframework.security.web.header.writers.ContentSecurityPolicyHeaderWriter;
import org.springframework.security.web.header.writers.DelegatingRequestMatcherHeaderWriter;
import org.springframework.security.web.header.writers.StaticHeadersWriter;
import org.springframework.security.web.header.writers.XContentTypeOptionsHeaderWriter;
import org.springframework.security.web.header.writers.frameoptions.XFrameOptionsHeaderWriter;

/**
 * Security headers on every answer (calculations, problems, batches, actuator, OpenAPI): no MIME
 * sniffing, no caching, no framing, written by Spring Security's header writers. They run in
 * Spring Security's {@link HeaderWriterFilter}, registered on its own as the first servlet filter:
 * the answers need them whether or not the security filter chain is installed (it is only with
 * JWT authentication on, {@link SecurityOnlyWithJwt}), and the container's own refusals get the same
 * writers through {@link ProblemReportValve}.
 *
 * <p>The Content-Security-Policy of JSON answers allows nothing to load; the Swagger UI page loads
 * its own scripts, styles and images from this origin and fetches the OpenAPI document, so it gets a
 * same-origin policy. Both forbid framing ({@code frame-ancestors 'none'}, and X-Frame-Options DENY
 * for older browsers).
 */
@Configuration(proxyBeanMethods = false)
class SecurityHeaders {
    static final String API_POLICY = "default-src 'none'; frame-ancestors 'none'";
    static final String UI_POLICY = "default-src 'self'; img-src 'self' data:; style-src 'self' 'unsafe-inline'; "
            + "frame-ancestors 'none'";

    /** The writers of every answer; the UI path is springdoc.swagger-ui.path, its assets are under /swagger-ui/. */
    static HeaderWriter writers(String uiPath) {
        return new CompositeHeaderWriter(List.of(
                new XContentTypeOptionsHeaderWriter(),
                new StaticHeadersWriter("Cache-Control", "no-store"),
                new XFrameOptionsHeaderWriter(XFrameOptionsHeaderWriter.XFrameOptionsMode.DENY),
                new DelegatingRequestMatcherHeaderWriter(request -> isUi(request, uiPath),
                        new ContentSecurityPolicyHeaderWriter(UI_POLICY)),
                new ContentSecurityPolicyHeaderWriter(API_POLICY)));
    }

    @Bean
    FilterRegistrationBean<HeaderWriterFilter> securityHeadersFilter(
            @Value("${springdoc.swagger-ui.path:/swagger-ui.html}") String uiPath) {
        var registration = new FilterRegistrationBean<>(new HeaderWriterFilter(List.of(writers(uiPath))));
        registration.setOrder(Ordered.HIGHEST_PRECEDENCE);
        registration.setDispatcherTypes(DispatcherType.REQUEST);
        registration.setAsyncSupported(true);
        return registration;
    }

    /**
     * Tomcat's own refusals (before the application: an invalid URI, a malformed request line) as
     * problems with the same headers, in place of the container's HTML page. Runs after Boot's
     * customizer, which puts an HTML error report valve on the host; that valve is replaced.
     */
    @Bean
    WebServerFactoryCustomizer<TomcatServletWebServerFactory> problemReportValve(JsonMapper mapper,
            @Value("${springdoc.swagger-ui.path:/swagger-ui.html}") String uiPath) {
        return new ProblemReportInstaller(new ProblemReportValve(mapper, writers(uiPath)));
    }

    record ProblemReportInstaller(ProblemReportValve valve)
            implements WebServerFactoryCustomizer<TomcatServletWebServerFactory>, Ordered {
        @Override
        public void customize(TomcatServletWebServerFactory factory) {
            factory.addContextCustomizers(context -> {
                var host = context.getParent();
                if (host == null) {
                    return;
                }
                for (var existing : host.getPipeline().getValves()) {
                    if (existing instanceof ErrorReportValve) {
                        host.getPipeline().removeValve(existing);
                    }
                }
                host.getPipeline().addValve(valve);
                if (host instanceof StandardHost standard) {
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
    public static final class NoErrorReport extends ValveBase {
        public NoErrorReport() {
            super(true);
        }

        @Override
        public void invoke(Request request, Response response) throws IOException, ServletException {
            getNext().invoke(request, response);
        }
    }

    private static boolean isUi(HttpServletRequest request, String uiPath) {
        String path = request.getRequestURI().substring(request.getContextPath().length());
        return path.equals(uiPath) || path.startsWith("/swagger-ui/");
    }
}
