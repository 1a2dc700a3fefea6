package utdigit.reliability;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.catchThrowable;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.springframework.boot.builder.SpringApplicationBuilder;
import utdigit.UtDigitizationApplication;
import utdigit.web.rules.ProfileException;

/**
 * A bad operator profile stops start-up at once, naming the file and the place in it, instead of a
 * service that starts and then validates sheets against a profile it could not read.
 */
class BadProfileStartupTest {

    private static Throwable startWith(Path directory) {
        // Command-line arguments: they take precedence over application.yml (default properties do not).
        return catchThrowable(() -> new SpringApplicationBuilder(UtDigitizationApplication.class)
                .run("--server.port=0", "--utdigit.profiles.directory=" + directory).close());
    }

    private static ProfileException profileProblem(Throwable failure) {
        for (Throwable t = failure; t != null; t = t.getCause()) {
            if (t instanceof ProfileException p) {
                return p;
            }
        }
        throw new AssertionError("start-up did not fail with a profile problem", failure);
    }

    @Test
    void malformedYamlStopsStartUpNamingTheFileLineAndColumn(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("site-rules.yaml");
        Files.writeString(file, """
                id: site-rules
                title: "Site rules
                rules:
                  - id: r1
                    metric: samples_per_period
                    at_least: 5
                """);
        Throwable failure = startWith(dir);
        ProfileException p = profileProblem(failure);
        assertThat(p.source()).endsWith("site-rules.yaml");
        assertThat(p.line()).isPositive();
        assertThat(p.getMessage()).contains("site-rules.yaml");
        System.out.println("Bad profile start-up: failed with \"" + p.getMessage() + "\"");
    }

    @Test
    void profileThatIsValidYamlButNotAProfileStopsStartUpToo(@TempDir Path dir) throws Exception {
        Files.writeString(dir.resolve("numbers.yaml"), """
                id: numbers
                title: Numbers
                rules:
                  - id: r1
                    metric: samples_per_period
                    at_least: [5, 6]
                """);
        ProfileException p = profileProblem(startWith(dir));
        assertThat(p.getMessage()).contains("numbers.yaml").contains("line 6, column 15");
    }

    @Test
    void missingDirectoryStopsStartUpNamingIt(@TempDir Path dir) {
        Path missing = dir.resolve("no-such-directory");
        ProfileException p = profileProblem(startWith(missing));
        assertThat(p.getMessage()).contains("no-such-directory").contains("does not exist");
    }
}
