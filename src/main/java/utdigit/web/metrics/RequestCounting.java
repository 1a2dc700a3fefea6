package utdigit.web.metrics;

import jakarta.servlet.FilterChain;
import jakarta.servlet.ServletException;
import jakarta.servlet.http.HttpServletRequest;
import jakarta.servlet.http.HttpServletResponse;
import java.io.IOException;
import java.util.Map;
import org.springframework.stereotype.Component;
import org.springframework.web.filter.OncePerRequestFilter;
import org.springframework.web.servlet.HandlerMapping;
import utdigit.web.pipeline.CalculationRunner;

/**
 * Counts every request under /api/ once it is answered ({@link ServiceMetrics#REQUESTS}): the
 * endpoint is the matched path pattern below /api/ with the batch's calculation filled in
 * ({@code pulse-parameters/batch}, {@code materials/{id}}), or {@code unmatched}.
 */
@Component
class RequestCounting extends OncePerRequestFilter {
    static final String UNMATCHED = "unmatched";
    private static final String API = "/api/";

    private final ServiceMetrics metrics;
    private final java.util.Set<String> calculations;

    RequestCounting(ServiceMetrics metrics, CalculationRunner runner) {
        this.metrics = metrics;
        this.calculations = java.util.Set.copyOf(runner.names());
    }

    @Override
    protected boolean shouldNotFilter(HttpServletRequest request) {
        return !request.getRequestURI().startsWith(API);
    }

    @Override
    protected void doFilterInternal(HttpServletRequest request, HttpServletResponse response, FilterChain chain)
            throws ServletException, IOException {
        int status = 500;
        try {
            chain.doFilter(request, response);
            status = response.getStatus();
        } finally {
            metrics.request(endpoint(request, calculations), request.getMethod(), status);
        }
    }

    /** The matched pattern below /api/, the batch's {calculation} replaced by its value when it is one. */
    static String endpoint(HttpServletRequest request, java.util.Set<String> calculations) {
        Object pattern = request.getAttribute(HandlerMapping.BEST_MATCHING_PATTERN_ATTRIBUTE);
        if (!(pattern instanceof String p) || !p.startsWith(API)) {
            return UNMATCHED;
        }
        String endpoint = p.substring(API.length());
        if (endpoint.startsWith("{calculation")) {
            Object variables = request.getAttribute(HandlerMapping.URI_TEMPLATE_VARIABLES_ATTRIBUTE);
            Object calculation = variables instanceof Map<?, ?> m ? m.get("calculation") : null;
            if (calculation == null || !calculations.contains(calculation)) {
                return UNMATCHED; // only the service's own calculation names become labels
            }
            endpoint = calculation + endpoint.substring(endpoint.indexOf('}') + 1);
        }
        return endpoint;
    }
}
