package utdigit.web.json;

import com.fasterxml.jackson.annotation.JsonInclude;
import org.springframework.beans.factory.annotation.Value;
import org.springframework.context.annotation.Bean;
import org.springframework.context.annotation.Configuration;
import org.springframework.http.ProblemDetail;
import org.springframework.http.converter.json.ProblemDetailJacksonMixin;
import tools.jackson.core.StreamReadConstraints;
import tools.jackson.core.StreamReadFeature;
import tools.jackson.core.StreamWriteFeature;
import tools.jackson.core.json.JsonFactory;
import tools.jackson.databind.DeserializationFeature;
import tools.jackson.databind.cfg.EnumFeature;
import tools.jackson.databind.json.JsonMapper;

/**
 * The one JSON mapper of the service: snake_case properties, nulls omitted (an empty
 * {@link java.util.Optional} is written as null: "does not exist"), and strict reading (unknown
 * properties, duplicate keys, trailing tokens, numbers for enums, quoted numbers, non-finite numbers
 * and fractions into integers are all rejected). Read limits are explicit, not library defaults
 * (nesting depth, number, string, name and document length).
 */
@Configuration(proxyBeanMethods = false)
class JsonConfiguration {

    @Bean
    JsonMapper jsonMapper(
            @Value("${utdigit.json.max-nesting-depth:32}") int maxNestingDepth,
            @Value("${utdigit.json.max-number-length:1000}") int maxNumberLength,
            @Value("${utdigit.json.max-string-length:10000}") int maxStringLength,
            @Value("${utdigit.json.max-name-length:200}") int maxNameLength,
            @Value("${utdigit.json.max-document-length:${utdigit.batch.max-body-bytes:2147483648}}")
            long maxDocumentLength) {
        // One JSON-array batch body is one document for the parser, so the document limit is the
        // batch body limit; single-endpoint bodies are capped lower before parsing
        // (utdigit.json.max-body-bytes, utdigit.web.limits.RequestBodyFilter).
        StreamReadConstraints limits = StreamReadConstraints.builder()
                .maxNestingDepth(maxNestingDepth)
                .maxNumberLength(maxNumberLength)
                .maxStringLength(maxStringLength)
                .maxNameLength(maxNameLength)
                .maxDocumentLength(maxDocumentLength)
                .build();
        JsonFactory factory = JsonFactory.builder().streamReadConstraints(limits).build();
        return StrictJson.configure(JsonMapper.builder(factory)).build();
    }

    /** The strict settings, shared with tests and tools that need the same mapper without Spring. */
    static final class StrictJson {
        private StrictJson() {}

        static JsonMapper.Builder configure(JsonMapper.Builder builder) {
            return builder
                    .propertyNamingStrategy(new ContractNaming.Jackson3())
                    .changeDefaultPropertyInclusion(incl -> JsonInclude.Value.construct(
                            JsonInclude.Include.NON_NULL, JsonInclude.Include.NON_NULL))
                    .enable(DeserializationFeature.FAIL_ON_UNKNOWN_PROPERTIES,
                            DeserializationFeature.FAIL_ON_TRAILING_TOKENS,
                            DeserializationFeature.FAIL_ON_NULL_FOR_PRIMITIVES)
                    .disable(DeserializationFeature.ACCEPT_FLOAT_AS_INT)
                    .enable(EnumFeature.FAIL_ON_NUMBERS_FOR_ENUMS)
                    .enable(StreamReadFeature.STRICT_DUPLICATE_DETECTION)
                    // doubles written with the shortest digits that read back (Schubfach), as the
                    // stamp's canonical form and the CSV cells write them; Java 17's own writer is
                    // slower and sometimes longer
                    .enable(StreamWriteFeature.USE_FAST_DOUBLE_WRITER)
                    .addMixIn(ProblemDetail.class, ProblemDetailJacksonMixin.class)
                    .addModule(StrictScalars.module());
        }
    }
}
