package utdigit.web.rules;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.stream.Stream;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.beans.factory.annotation.Value;
import org.springframework.core.io.Resource;
import org.springframework.core.io.support.PathMatchingResourcePatternResolver;
import org.springframework.stereotype.Component;
import utdigit.core.rules.RequirementProfile;

/**
 * Every requirement profile the service knows, loaded and validated once at start-up: the built-in
 * ones (every classpath {@code profiles/*.yaml}) and the operator's (every {@code *.yaml} directly in
 * the directory of property {@code utdigit.profiles.directory}, environment variable
 * {@code UTDIGIT_PROFILES_DIRECTORY}; empty: none). Any problem stops start-up with a
 * {@link ProfileException}: a configured directory that does not exist, a file that is not a valid
 * profile, or a profile id used twice (an operator profile cannot replace a built-in one: give it
 * its own id).
 *
 * <p>Order: built-in profiles by file name, then operator profiles by file name. Immutable and
 * thread-safe after construction.
 */
@Component
public final class ProfileCatalog {
    private static final Logger log = LoggerFactory.getLogger(ProfileCatalog.class);

    /** Where the built-in profiles live on the classpath. */
    static final String BUILT_IN_PATTERN = "classpath*:profiles/*.yaml";

    private final Map<String, RequirementProfile> byId;

    /**
     * Loads the built-in profiles and those of the operator's directory.
     *
     * @param directory the operator's directory; null or blank: none
     */
    @Autowired
    public ProfileCatalog(@Value("${utdigit.profiles.directory:}") String directory) {
        this(directory == null || directory.isBlank() ? null : Path.of(directory.strip()));
    }

    /**
     * Loads the built-in profiles and those of {@code operatorDirectory}.
     *
     * @param operatorDirectory the operator's directory, or null for none
     */
    public ProfileCatalog(Path operatorDirectory) {
        List<ProfileParser.Parsed> parsed = new ArrayList<>(builtIn());
        if (operatorDirectory != null) {
            parsed.addAll(operator(operatorDirectory));
        }
        Map<String, ProfileParser.Parsed> seen = new LinkedHashMap<>();
        for (ProfileParser.Parsed p : parsed) {
            ProfileParser.Parsed first = seen.putIfAbsent(p.profile().id(), p);
            if (first != null) {
                throw new ProfileException(p.source(), p.idAt().getLineNr(), p.idAt().getColumnNr(),
                        "profile id '" + p.profile().id() + "' is already defined by " + first.source()
                                + "; every profile needs its own id (an operator profile cannot replace a "
                                + "built-in one)");
            }
        }
        Map<String, RequirementProfile> profiles = new LinkedHashMap<>();
        seen.forEach((id, p) -> profiles.put(id, p.profile()));
        this.byId = java.util.Collections.unmodifiableMap(profiles);
        log.info("Loaded {} requirement profiles: {}", byId.size(), String.join(", ", byId.keySet()));
    }

    /** The profile with this id, if one is loaded. */
    public Optional<RequirementProfile> find(String id) {
        return Optional.ofNullable(id == null ? null : byId.get(id));
    }

    /** Every loaded profile: built-in ones first, each group by file name. */
    public List<RequirementProfile> all() {
        return List.copyOf(byId.values());
    }

    /** The ids of every loaded profile, in the order of {@link #all()}. */
    public List<String> ids() {
        return List.copyOf(byId.keySet());
    }

    private static List<ProfileParser.Parsed> builtIn() {
        Resource[] resources;
        try {
            resources = new PathMatchingResourcePatternResolver(ProfileCatalog.class.getClassLoader())
                    .getResources(BUILT_IN_PATTERN);
        } catch (IOException e) {
            throw new ProfileException(BUILT_IN_PATTERN, 0, 0, "cannot list the built-in profiles: " + e.getMessage());
        }
        List<Resource> sorted = new ArrayList<>(List.of(resources));
        sorted.sort(Comparator.comparing(r -> String.valueOf(r.getFilename())));
        List<ProfileParser.Parsed> parsed = new ArrayList<>();
        for (Resource r : sorted) {
            String source = "classpath:profiles/" + r.getFilename();
            try (InputStream in = r.getInputStream()) {
                parsed.add(ProfileParser.parse(source, in.readAllBytes()));
            } catch (IOException e) {
                throw new ProfileException(source, 0, 0, "cannot read: " + e.getMessage());
            }
        }
        return parsed;
    }

    private static List<ProfileParser.Parsed> operator(Path directory) {
        Path dir = directory.toAbsolutePath().normalize();
        if (!Files.exists(dir)) {
            throw new ProfileException(dir.toString(), 0, 0, "the profile directory (utdigit.profiles.directory, "
                    + "UTDIGIT_PROFILES_DIRECTORY) does not exist; leave it empty for built-in profiles only");
        }
        if (!Files.isDirectory(dir)) {
            throw new ProfileException(dir.toString(), 0, 0, "the profile directory (utdigit.profiles.directory, "
                    + "UTDIGIT_PROFILES_DIRECTORY) is not a directory");
        }
        List<Path> files;
        try (Stream<Path> list = Files.list(dir)) {
            files = list.filter(f -> f.getFileName().toString().endsWith(".yaml") && Files.isRegularFile(f))
                    .sorted(Comparator.comparing(f -> f.getFileName().toString()))
                    .toList();
        } catch (IOException e) {
            throw new ProfileException(dir.toString(), 0, 0, "cannot list the profile directory: " + e.getMessage());
        }
        List<ProfileParser.Parsed> parsed = new ArrayList<>();
        for (Path f : files) {
            try {
                parsed.add(ProfileParser.parse(f.toString(), Files.readAllBytes(f)));
            } catch (IOException e) {
                throw new ProfileException(f.toString(), 0, 0, "cannot read: " + e.getMessage());
            }
        }
        try (Stream<Path> list = Files.list(dir)) {
            list.filter(f -> f.getFileName().toString().endsWith(".yml"))
                    .forEach(f -> log.warn("Ignored {}: only *.yaml files are read as profiles", f));
        } catch (IOException e) {
            // listed once above; nothing more to say
        }
        if (files.isEmpty()) {
            log.warn("The profile directory {} holds no *.yaml file", dir);
        }
        return parsed;
    }
}
