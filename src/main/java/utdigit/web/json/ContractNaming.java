package utdigit.web.json;

/**
 * The contract's snake_case rule for Java names: an underscore before every upper-case letter and
 * before a run of digits that follows a letter, all lower case. So {@code longitudinalMPerS}
 * becomes {@code longitudinal_m_per_s}, {@code lowerFrequency20dbMhz} becomes
 * {@code lower_frequency_20db_mhz} and {@code samplesPerAScan} becomes {@code samples_per_a_scan}.
 * One rule for reading, writing, error pointers and the OpenAPI document.
 */
public final class ContractNaming {
    private ContractNaming() {}

    public static String snake(String javaName) {
        if (javaName == null || javaName.isEmpty()) {
            return javaName;
        }
        StringBuilder out = new StringBuilder(javaName.length() + 8);
        char previous = 0;
        for (int i = 0; i < javaName.length(); i++) {
            char c = javaName.charAt(i);
            if (Character.isUpperCase(c)) {
                if (i > 0 && previous != '_') {
                    out.append('_');
                }
                out.append(Character.toLowerCase(c));
            } else if (Character.isDigit(c) && i > 0 && Character.isLetter(previous)) {
                out.append('_').append(c);
            } else {
                out.append(c);
            }
            previous = c;
        }
        return out.toString();
    }

    /** The rule as a naming strategy of the service's JSON mapper (Jackson 3). */
    static final class Jackson3 extends tools.jackson.databind.PropertyNamingStrategies.NamingBase {
        @Override
        public String translate(String propertyName) {
            return snake(propertyName);
        }
    }

    /** The same rule for the OpenAPI generator, which introspects with Jackson 2. */
    public static final class Jackson2 extends com.fasterxml.jackson.databind.PropertyNamingStrategies.NamingBase {
        @Override
        public String translate(String propertyName) {
            return snake(propertyName);
        }
    }
}
