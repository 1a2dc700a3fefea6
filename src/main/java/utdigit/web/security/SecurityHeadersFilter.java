package utdigit.web.security;

import jakarta.servlet.FilterChain;
import jakarta.servlet.ServletException;
import jakarta.servlet.http.HttpServletRequest;
import jakarta.servlet.http.HttpServletResponse;
import jakarta.servlet.http.HttpServletResponseWrapper;
import java.io.IOException;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.stream.Collectors;
import org.springframework.web.filter.OncePerRequestFilter;

/**
 * Security headers on every answer the application writes (calculations, problems, batches,
 * actuator, OpenAPI): no MIME sniffing, no caching, no framing. Set before anything else runs, and
 * pinned: later attempts to change them (a resource handler's Cache-Control, say) are ignored, and a
 * reset of the response puts them back.
 *
 * <p>The Content-Security-Policy of JSON answers allows nothing to load; the Swagger UI page loads
 * its own scripts, styles and images from this origin and fetches the OpenAPI document, so it gets a
 * same-origin policy. Both forbid framing ({@code frame-ancestors 'none'}, and X-Frame-Options DENY
 * for older browsers).
 */
final class SecurityHeadersFilter extends OncePerRequestFilter {
    static final String API_POLICY = "default-src 'none'; frame-ancestors 'none'";
    static final String UI_POLICY = "default-src 'self'; img-src 'self' data:; style-src 'self' 'unsafe-inline'; "
            + "frame-ancestors 'none'";

    /** The headers of every answer but the Swagger UI's (also written by {@link ProblemReportValve}). */
    static final Map<String, String> API_HEADERS = headers(API_POLICY);
    private static final Map<String, String> UI_HEADERS = headers(UI_POLICY);
    /** Their names in lower case, for the case-insensitive checks of {@link PinnedHeaders}. */
    private static final Set<String> PINNED = API_HEADERS.keySet().stream()
            .map(h -> h.toLowerCase(Locale.ROOT)).collect(Collectors.toUnmodifiableSet());

    private final String uiPath;

    /** @param uiPath the Swagger UI page (springdoc.swagger-ui.path); its assets are under /swagger-ui/ */
    SecurityHeadersFilter(String uiPath) {
        this.uiPath = uiPath;
    }

    @Override
    protected boolean shouldNotFilterAsyncDispatch() {
        return false;
    }

    @Override
    protected boolean shouldNotFilterErrorDispatch() {
        return false;
    }

    @Override
    protected void doFilterInternal(HttpServletRequest request, HttpServletResponse response, FilterChain chain)
            throws ServletException, IOException {
        PinnedHeaders pinned = new PinnedHeaders(response, isUi(request) ? UI_HEADERS : API_HEADERS);
        pinned.apply();
        chain.doFilter(request, pinned);
    }

    private static Map<String, String> headers(String contentSecurityPolicy) {
        return Map.of(
                "X-Content-Type-Options", "nosniff",
                "Cache-Control", "no-store",
                "X-Frame-Options", "DENY",
                "Content-Security-Policy", contentSecurityPolicy);
    }

    private boolean isUi(HttpServletRequest request) {
        String path = request.getRequestURI().substring(request.getContextPath().length());
        return path.equals(uiPath) || path.startsWith("/swagger-ui/");
    }

    /** A response whose security headers keep the values the filter set. */
    static final class PinnedHeaders extends HttpServletResponseWrapper {
        private final Map<String, String> headers;

        PinnedHeaders(HttpServletResponse response, Map<String, String> headers) {
            super(response);
            this.headers = headers;
        }

        void apply() {
            headers.forEach(super::setHeader);
        }

        private static boolean pinned(String name) {
            return name != null && PINNED.contains(name.trim().toLowerCase(Locale.ROOT));
        }

        @Override
        public void setHeader(String name, String value) {
            if (!pinned(name)) {
                super.setHeader(name, value);
            }
        }

        @Override
        public void addHeader(String name, String value) {
            if (!pinned(name)) {
                super.addHeader(name, value);
            }
        }

        @Override
        public void setDateHeader(String name, long date) {
            if (!pinned(name)) {
                super.setDateHeader(name, date);
            }
        }

        @Override
        public void addDateHeader(String name, long date) {
            if (!pinned(name)) {
                super.addDateHeader(name, date);
            }
        }

        @Override
        public void reset() {
            super.reset();
            apply();
        }
    }
}
