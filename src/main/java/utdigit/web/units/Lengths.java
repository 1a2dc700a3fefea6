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

/**
 * The range of a length input, declared once for every request: above 0 and at most
 * {@link Mirrors#MAX_MM} in mm; above 0 in inches (the mm range is checked after conversion by
 * {@link Mirrors}). The same for a speed in mm/s and in/s. Each is a composed Bean Validation
 * constraint (its messages are the composing constraints') whose OpenAPI bounds are the same: the
 * maximum through the Jackson annotation bundle, the exclusive minimum from the constraint (the
 * document's exclusive-bounds customizer reads composed constraints).
 */
public final class Lengths {
    private Lengths() {}

    /** {@code x_mm} (or {@code x_mm_per_s}): above 0, at most {@link Mirrors#MAX_MM}. */
    @Target({FIELD, METHOD, PARAMETER})
    @Retention(RUNTIME)
    @JacksonAnnotationsInside
    @Schema(maximum = Mirrors.MAX_MM)
    @Constraint(validatedBy = {})
    @DecimalMin(value = "0", inclusive = false)
    @DecimalMax(Mirrors.MAX_MM)
    public @interface Mm {
        String message() default "";

        Class<?>[] groups() default {};

        Class<? extends Payload>[] payload() default {};
    }

    /** {@code x_in} (or {@code x_in_per_s}): above 0 here, the mm range checked after conversion. */
    @Target({FIELD, METHOD, PARAMETER})
    @Retention(RUNTIME)
    @Constraint(validatedBy = {})
    @DecimalMin(value = "0", inclusive = false)
    public @interface In {
        String message() default "";

        Class<?>[] groups() default {};

        Class<? extends Payload>[] payload() default {};
    }
}
