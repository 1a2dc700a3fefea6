package utdigit.web.rules;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.springframework.boot.test.context.runner.ApplicationContextRunner;

/** The catalog as a Spring bean: the property decides the directory, and a bad profile stops start-up. */
class ProfileCatalogStartUpTest {
    private final ApplicationContextRunner runner = new ApplicationContextRunner()
            .withBean(ProfileCatalog.class);

    @TempDir
    Path dir;

    @Test
    void withoutThePropertyOnlyBuiltInProfilesLoad() {
        runner.run(context -> assertThat(context.getBean(ProfileCatalog.class).ids()).hasSize(5));
    }

    @Test
    void thePropertyNamesTheOperatorsDirectory() throws IOException {
        Files.writeString(dir.resolve("acme.yaml"), ProfileCatalogTest.GOOD);
        runner.withPropertyValues("utdigit.profiles.directory=" + dir)
                .run(context -> assertThat(context.getBean(ProfileCatalog.class).find("acme-pulse-echo")).isPresent());
    }

    @Test
    void aBadProfileStopsStartUpWithItsFileAndPosition() throws IOException {
        String yaml = ProfileCatalogTest.GOOD.replace("metric: scan_increment_mm", "metric: scan_step");
        Files.writeString(dir.resolve("bad.yaml"), yaml);
        int[] at = ProfileCatalogTest.position(yaml, "scan_step");
        runner.withPropertyValues("utdigit.profiles.directory=" + dir).run(context -> {
            assertThat(context).hasFailed();
            assertThat(context.getStartupFailure()).rootCause().isInstanceOf(ProfileException.class)
                    .hasMessageContaining(dir.resolve("bad.yaml").toString())
                    .hasMessageContaining("line " + at[0] + ", column " + at[1])
                    .hasMessageContaining("unknown metric 'scan_step'");
        });
    }

    @Test
    void aMissingDirectoryStopsStartUp() {
        runner.withPropertyValues("utdigit.profiles.directory=" + dir.resolve("absent")).run(context -> {
            assertThat(context).hasFailed();
            assertThat(context.getStartupFailure()).rootCause().isInstanceOf(ProfileException.class)
                    .hasMessageContaining("does not exist");
        });
    }
}
