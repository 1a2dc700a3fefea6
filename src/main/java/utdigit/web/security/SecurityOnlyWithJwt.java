package utdigit.web.security;

import java.util.stream.Stream;
import org.springframework.boot.autoconfigure.AutoConfigurationImportFilter;
import org.springframework.boot.autoconfigure.AutoConfigurationMetadata;
import org.springframework.context.EnvironmentAware;
import org.springframework.context.annotation.Condition;
import org.springframework.context.annotation.ConditionContext;
import org.springframework.core.env.Environment;
import org.springframework.core.type.AnnotatedTypeMetadata;
import org.springframework.util.StringUtils;

/**
 * Spring Security only where it has a job: with a JWT issuer, JWK set or public key configured
 * (utdigit.security.jwt.* or spring.security.oauth2.resourceserver.jwt.*). Without one, its
 * auto-configuration is left out and no security filter chain is installed: an open service then
 * needs only the security headers ({@link SecurityHeaders}), and the chain is a measurable share
 * of each request's CPU (src/docs/performance.md, "What the profiles showed"). Registered in
 * META-INF/spring.factories; as a condition it switches {@link SecurityConfiguration} the same way.
 */
public final class SecurityOnlyWithJwt implements AutoConfigurationImportFilter, EnvironmentAware, Condition {
    private static final String SPRING_SECURITY = "org.springframework.boot.security.";
    private static final String[] JWT_KEYS = {
            "utdigit.security.jwt.issuer-uri", "utdigit.security.jwt.jwk-set-uri",
            "spring.security.oauth2.resourceserver.jwt.issuer-uri",
            "spring.security.oauth2.resourceserver.jwt.jwk-set-uri",
            "spring.security.oauth2.resourceserver.jwt.public-key-location"};

    private Environment environment;

    /** Whether authentication is configured: a JWT decoder will exist. */
    static boolean jwtConfigured(Environment environment) {
        return Stream.of(JWT_KEYS).anyMatch(key -> StringUtils.hasText(environment.getProperty(key)));
    }

    @Override
    public void setEnvironment(Environment environment) {
        this.environment = environment;
    }

    @Override
    public boolean[] match(String[] autoConfigurationClasses, AutoConfigurationMetadata metadata) {
        boolean secured = jwtConfigured(environment);
        boolean[] keep = new boolean[autoConfigurationClasses.length];
        for (int i = 0; i < keep.length; i++) {
            String name = autoConfigurationClasses[i];
            keep[i] = secured || name == null || !name.startsWith(SPRING_SECURITY);
        }
        return keep;
    }

    @Override
    public boolean matches(ConditionContext context, AnnotatedTypeMetadata metadata) {
        return jwtConfigured(context.getEnvironment());
    }
}
