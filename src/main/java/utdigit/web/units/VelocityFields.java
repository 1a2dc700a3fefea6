package utdigit.web.units;

import static java.lang.annotation.ElementType.FIELD;
import static java.lang.annotation.ElementType.METHOD;
import static java.lang.annotation.ElementType.PARAMETER;
import static java.lang.annotation.RetentionPolicy.RUNTIME;

import com.fasterxml.jackson.annotation.JacksonAnnotationsInside;
import io.swagger.v3.oas.annotations.media.Schema;
import jakarta.validation.Constraint;
import jakarta.validation.Payload;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import java.lang.annotation.Retention;
import java.lang.annotation.Target;
import utdigit.core.materials.WaveMode;

/**
 * The velocity inputs shared by every request that needs a sound velocity: exactly one of
 * velocity_m_per_s, velocity_in_per_us or material (with wave_mode, and temperature_c for water).
 *
 * <p>A request record declares the five components with the annotations below, which carry each
 * field's contract once: its OpenAPI schema (read by the document's model resolver through the
 * Jackson annotation bundle) and its Bean Validation range (a composed constraint). What the
 * velocity serves is said in the request's own description. One record component unwrapped into
 * the request ({@code @JsonUnwrapped}) is not used: with Jackson 3.1 on a record (a creator) it
 * refuses the unwrapped properties as unknown under strict reading, and accepts unknown properties
 * without it.
 */
public interface VelocityFields {
    /** Lowest velocity accepted, m/s (also the bound of the in/us form after conversion). */
    int MIN_M_PER_S = 100;
    /** Highest velocity accepted, m/s. */
    int MAX_M_PER_S = 20_000;
    /** Lowest water temperature accepted, C. */
    int MIN_TEMPERATURE_C = 0;
    /** Highest water temperature accepted, C. */
    int MAX_TEMPERATURE_C = 95;

    Double velocityMPerS();

    Double velocityInPerUs();

    String material();

    WaveMode waveMode();

    Double temperatureC();

    /** {@code velocity_m_per_s}. */
    @Target({FIELD, METHOD, PARAMETER})
    @Retention(RUNTIME)
    @JacksonAnnotationsInside
    @Schema(description = "Sound velocity of the wave mode used, m/s (" + MIN_M_PER_S + " to " + MAX_M_PER_S + ")",
            example = "5920", minimum = "" + MIN_M_PER_S, maximum = "" + MAX_M_PER_S)
    @Constraint(validatedBy = {})
    @DecimalMin("" + MIN_M_PER_S)
    @DecimalMax("" + MAX_M_PER_S)
    @interface MPerS {
        String message() default "";

        Class<?>[] groups() default {};

        Class<? extends Payload>[] payload() default {};
    }

    /** {@code velocity_in_per_us}: above 0 here, the m/s range checked after conversion ({@link Mirrors}). */
    @Target({FIELD, METHOD, PARAMETER})
    @Retention(RUNTIME)
    @JacksonAnnotationsInside
    @Schema(description = "Sound velocity of the wave mode used, in/us (equivalent of " + MIN_M_PER_S + " to "
            + MAX_M_PER_S + " m/s)", example = "0.2331", exclusiveMinimumValue = 0)
    @Constraint(validatedBy = {})
    @DecimalMin(value = "0", inclusive = false)
    @interface InPerUs {
        String message() default "";

        Class<?>[] groups() default {};

        Class<? extends Payload>[] payload() default {};
    }

    /** {@code material}. */
    @Target({FIELD, METHOD, PARAMETER})
    @Retention(RUNTIME)
    @JacksonAnnotationsInside
    @Schema(description = "Built-in material id (GET /api/materials) whose velocity is used", example = "carbon-steel")
    @interface MaterialId {}

    /** {@code wave_mode}. */
    @Target({FIELD, METHOD, PARAMETER})
    @Retention(RUNTIME)
    @JacksonAnnotationsInside
    @Schema(description = "Wave mode of the material's velocity; default LONGITUDINAL. Only with material")
    @interface Mode {}

    /** {@code temperature_c}. */
    @Target({FIELD, METHOD, PARAMETER})
    @Retention(RUNTIME)
    @JacksonAnnotationsInside
    @Schema(description = "Water only: temperature, C (" + MIN_TEMPERATURE_C + " to " + MAX_TEMPERATURE_C
            + "); default 20", example = "20", minimum = "" + MIN_TEMPERATURE_C,
            maximum = "" + MAX_TEMPERATURE_C)
    @Constraint(validatedBy = {})
    @DecimalMin("" + MIN_TEMPERATURE_C)
    @DecimalMax("" + MAX_TEMPERATURE_C)
    @interface TemperatureC {
        String message() default "";

        Class<?>[] groups() default {};

        Class<? extends Payload>[] payload() default {};
    }
}
