package utdigit.web.openapi;

import io.swagger.v3.core.jackson.ModelResolver;
import io.swagger.v3.core.util.ObjectMapperFactory;
import io.swagger.v3.oas.models.OpenAPI;
import io.swagger.v3.oas.models.info.Info;
import io.swagger.v3.oas.models.info.License;
import org.springframework.beans.factory.annotation.Value;
import org.springframework.context.annotation.Bean;
import org.springframework.context.annotation.Configuration;
import tools.jackson.databind.JsonNode;
import utdigit.web.json.ContractNaming;

/**
 * The OpenAPI 3.1 document's header, and the model resolver that names schema properties by the
 * same snake_case rule as the JSON mapper, lets a property written even when null admit null, and
 * documents a JSON tree property (a document to verify, a differing value) as any JSON value.
 */
@Configuration(proxyBeanMethods = false)
class OpenApiConfiguration {
    static {
        // A controller returns Stamped<Answer>: the document shows the answer's schema (the stamp member is
        // added to every answer schema by OpenApiProblems), so no controller declares its schema again.
        org.springdoc.core.utils.SpringDocUtils.getConfig().addResponseWrapperToIgnore(utdigit.web.stamp.Stamped.class);
    }


    static final String DESCRIPTION = """
            Calculations that show whether a digital UT instrument's digitization settings are adequate \
            for a technique sheet: pulse and beam parameters, sampling adequacy (samples per period, \
            aliasing, amplitude loss), quantization error in dB, time-of-flight and thickness \
            resolution, acquisition budget (data volume, scan speed, wrap-around PRF), scan coverage, \
            phased-array apertures and grating lobes, TOFD set-up, DAC and TCG against the quantization, \
            and validation of whole technique sheets against requirement profiles, with tamper-evident \
            stamps.

            Units are in every quantity's name (_mhz, _us, _ns, _mm, _in, _m_per_s, _db, _deg, \
            _percent_fsh, _megabytes with MB = 10^6 bytes). Errors are RFC 9457 problems \
            (application/problem+json) with errors[{pointer, detail}].

            Caution: results support a qualified examiner; they never replace the qualification of a \
            procedure. The governing code edition, local codes and licensed practice decide. Built-in \
            velocities are planning defaults: measure the part's velocity for sizing.""";

    @Bean
    OpenAPI serviceOpenApi(@Value("${utdigit.service-version}") String version) {
        return new OpenAPI().info(new Info()
                .title("UT digitization calculation service")
                .version(version)
                .description(DESCRIPTION)
                .license(new License().name("Apache-2.0").identifier("Apache-2.0")))
                .servers(java.util.List.of(new io.swagger.v3.oas.models.servers.Server().url("/")));
    }

    /** The schema of any JSON value (OpenAPI 3.1: {@code {}}), with the property's description. */
    private static io.swagger.v3.oas.models.media.Schema<Object> anyJsonValue(java.lang.annotation.Annotation[] annotations) {
        var any = new io.swagger.v3.oas.models.media.Schema<Object>();
        any.addExtension(ContractSchemas.ANY_JSON_VALUE, true); // the resolver types it later; the customizer undoes that
        if (annotations != null) {
            for (var a : annotations) {
                if (a instanceof io.swagger.v3.oas.annotations.media.Schema doc && !doc.description().isEmpty()) {
                    any.description(doc.description());
                }
            }
        }
        return any;
    }

    @Bean
    ModelResolver contractNamingModelResolver() {
        var mapper = ObjectMapperFactory.createJson31();
        mapper.setPropertyNamingStrategy(new ContractNaming.Jackson2());
        return new ModelResolver(mapper) {
            @Override
            @SuppressWarnings("rawtypes")
            public io.swagger.v3.oas.models.media.Schema resolve(io.swagger.v3.core.converter.AnnotatedType type,
                    io.swagger.v3.core.converter.ModelConverterContext context,
                    java.util.Iterator<io.swagger.v3.core.converter.ModelConverter> chain) {
                if (type.getType() != null
                        && JsonNode.class.isAssignableFrom(_mapper.constructType(type.getType()).getRawClass())) {
                    return anyJsonValue(type.getCtxAnnotations()); // a JSON tree: any JSON value, not the tree's bean
                }
                return super.resolve(type, context, chain);
            }

            @Override
            protected boolean applyBeanValidatorAnnotations(com.fasterxml.jackson.databind.introspect.BeanPropertyDefinition
                    definition, io.swagger.v3.oas.models.media.Schema property, java.lang.annotation.Annotation[] annotations,
                    io.swagger.v3.oas.models.media.Schema parent, boolean applyNotNullAnnotations) {
                boolean applied = super.applyBeanValidatorAnnotations(definition, property, annotations, parent,
                        applyNotNullAnnotations);
                if (ContractSchemas.writtenWhenNull(annotations)) {
                    ContractSchemas.nullable(property); // written even when null: the schema admits null
                }
                return applied;
            }
        };
    }
}
