package utdigit.web.security;

import jakarta.servlet.http.HttpServletRequest;
import jakarta.servlet.http.HttpServletResponse;
import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import org.springframework.beans.factory.annotation.Value;
import org.springframework.boot.autoconfigure.condition.ConditionalOnExpression;
import org.springframework.context.annotation.Bean;
import org.springframework.context.annotation.Conditional;
import org.springframework.context.annotation.Configuration;
import org.springframework.http.HttpHeaders;
import org.springframework.security.config.annotation.web.builders.HttpSecurity;
import org.springframework.security.config.observation.SecurityObservationSettings;
import org.springframework.security.config.annotation.web.configurers.AbstractHttpConfigurer;
import org.springframework.security.config.http.SessionCreationPolicy;
import org.springframework.security.oauth2.core.DelegatingOAuth2TokenValidator;
import org.springframework.security.oauth2.core.OAuth2TokenValidator;
import org.springframework.security.oauth2.jwt.Jwt;
import org.springframework.security.oauth2.jwt.JwtClaimNames;
import org.springframework.security.oauth2.jwt.JwtClaimValidator;
import org.springframework.security.oauth2.jwt.JwtDecoder;
import org.springframework.security.oauth2.jwt.JwtValidators;
import org.springframework.security.oauth2.jwt.NimbusJwtDecoder;
import org.springframework.security.oauth2.jwt.SupplierJwtDecoder;
import org.springframework.security.web.AuthenticationEntryPoint;
import org.springframework.security.web.SecurityFilterChain;
import org.springframework.security.web.firewall.RequestRejectedHandler;
import org.springframework.util.StringUtils;
import utdigit.web.problem.ProblemType;
import utdigit.web.limits.ProblemResponses;
import utdigit.web.limits.RequestBodyFilter;

/**
 * Optional authentication. Off by default: every endpoint is open and Spring Security is not
 * installed at all ({@link SecurityOnlyWithJwt}). With a JWT decoder configured
 * (utdigit.security.jwt.issuer-uri or jwk-set-uri, or Spring's
 * spring.security.oauth2.resourceserver.jwt.*), every /api call needs a valid bearer token: a
 * missing or rejected token is a 401 problem; no login page, no session and no CSRF token (the API
 * is stateless and takes no cookies). Health, info, metrics and the OpenAPI document stay open
 * either way. Security headers are written by {@link SecurityHeaders}, ahead of this chain.
 */
@Configuration(proxyBeanMethods = false)
@Conditional(SecurityOnlyWithJwt.class)
class SecurityConfiguration {

    @Bean
    SecurityFilterChain serviceSecurity(HttpSecurity http, JwtDecoder decoder,
                                        ProblemResponses problems) throws Exception {
        AuthenticationEntryPoint unauthorized = (request, response, e) -> unauthorized(problems, request, response);
        http.csrf(AbstractHttpConfigurer::disable)
                .sessionManagement(s -> s.sessionCreationPolicy(SessionCreationPolicy.STATELESS))
                .requestCache(AbstractHttpConfigurer::disable)
                .formLogin(AbstractHttpConfigurer::disable)
                .httpBasic(AbstractHttpConfigurer::disable)
                .logout(AbstractHttpConfigurer::disable)
                .headers(AbstractHttpConfigurer::disable)
                .exceptionHandling(e -> e.authenticationEntryPoint(unauthorized));
        http.authorizeHttpRequests(a -> a.requestMatchers("/api/**").authenticated().anyRequest().permitAll())
                .oauth2ResourceServer(o -> o.jwt(j -> j.decoder(decoder)).authenticationEntryPoint(unauthorized));
        return http.build();
    }

    /**
     * Spring Security's own observations are off (they wrap every filter of the chain in an
     * observation: more CPU per request than most calculations, src/docs/performance.md; the
     * service exports no traces).
     */
    @Bean
    SecurityObservationSettings noSecurityObservations() {
        return SecurityObservationSettings.noObservations();
    }

    /** A JWT decoder from the service's own keys, when one of them is set. */
    @Bean
    @ConditionalOnExpression("'${utdigit.security.jwt.issuer-uri:}' != '' or '${utdigit.security.jwt.jwk-set-uri:}' != ''")
    JwtDecoder serviceJwtDecoder(@Value("${utdigit.security.jwt.issuer-uri:}") String issuer,
                                 @Value("${utdigit.security.jwt.jwk-set-uri:}") String jwkSetUri,
                                 @Value("${utdigit.security.jwt.audience:}") String audience) {
        List<OAuth2TokenValidator<Jwt>> validators = new ArrayList<>();
        validators.add(StringUtils.hasText(issuer) ? JwtValidators.createDefaultWithIssuer(issuer)
                : JwtValidators.createDefault());
        if (StringUtils.hasText(audience)) {
            validators.add(new JwtClaimValidator<List<String>>(JwtClaimNames.AUD,
                    aud -> aud != null && aud.contains(audience)));
        }
        OAuth2TokenValidator<Jwt> validator = new DelegatingOAuth2TokenValidator<>(validators);
        if (StringUtils.hasText(jwkSetUri)) {
            NimbusJwtDecoder decoder = NimbusJwtDecoder.withJwkSetUri(jwkSetUri).build();
            decoder.setJwtValidator(validator);
            return decoder;
        }
        // Discovery at the issuer happens on the first call, so start-up does not depend on it.
        return new SupplierJwtDecoder(() -> {
            NimbusJwtDecoder decoder = NimbusJwtDecoder.withIssuerLocation(issuer).build();
            decoder.setJwtValidator(validator);
            return decoder;
        });
    }

    /** Requests the firewall refuses (encoded slashes, path traversal, control characters): a 400 problem. */
    @Bean
    RequestRejectedHandler requestRejectedHandler(ProblemResponses problems) {
        return (request, response, e) -> {
            if (RequestBodyFilter.hasBody(request)) {
                problems.writeAndClose(request, response, ProblemType.INVALID_INPUT,
                        "the request line or a header is not accepted");
            } else {
                problems.write(request, response, ProblemType.INVALID_INPUT, "the request line or a header is not accepted");
            }
        };
    }

    private static void unauthorized(ProblemResponses problems, HttpServletRequest request,
                                     HttpServletResponse response) throws IOException {
        boolean tokenSent = request.getHeader(HttpHeaders.AUTHORIZATION) != null;
        response.setHeader(HttpHeaders.WWW_AUTHENTICATE, tokenSent ? "Bearer error=\"invalid_token\"" : "Bearer");
        String detail = tokenSent
                ? "the bearer token is not accepted (signature, expiry, issuer or audience); send a valid JWT as "
                        + "Authorization: Bearer <token>"
                : "this deployment requires a JWT bearer token on /api: send Authorization: Bearer <token>";
        if (RequestBodyFilter.hasBody(request)) {
            problems.writeAndClose(request, response, ProblemType.UNAUTHORIZED, detail);
        } else {
            problems.write(request, response, ProblemType.UNAUTHORIZED, detail);
        }
    }
}
