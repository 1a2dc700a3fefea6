package utdigit.web.references;

import static io.restassured.RestAssured.given;
import static org.assertj.core.api.Assertions.assertThat;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.everyItem;
import static org.hamcrest.Matchers.hasItems;
import static org.hamcrest.Matchers.notNullValue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.ObjectMapper;
import utdigit.core.common.Source;
import utdigit.core.common.SourceCheck;
import utdigit.core.common.SourceKind;
import utdigit.core.common.Sources;
import utdigit.web.support.ApiTest;

class ReferencesApiTest extends ApiTest {

    @Test
    void theCatalogueListsEverySourceWithItsKindAndCheck() {
        given().get("/api/references").then().statusCode(200)
                .body("references.size()", equalTo(Sources.all().size()))
                .body("references.id", hasItems("jcgm-100-2008-4.3.7", "iso-22232-2-steel-reference-values",
                        "scipy-gausspulse", "tofd-geometry", "wraparound-prf"))
                .body("references.kind", everyItem(notNullValue()))
                .body("references.checked", everyItem(notNullValue()))
                .body("references.check_note", everyItem(notNullValue()));
    }

    @Test
    void oneSourceByIdAndAnUnknownIdIsA404() {
        given().get("/api/references/jcgm-100-2008-4.3.7").then().statusCode(200)
                .body("kind", equalTo("STANDARD"))
                .body("edition", equalTo("2008"))
                .body("checked", equalTo("READ_SECOND_HAND"));
        given().get("/api/references/no-such-source").then().statusCode(404)
                .contentType("application/problem+json")
                .body("type", equalTo("/problems/not-found"));
    }

    @Test
    void derivationsAndPracticesPointToTheMethodsDocumentAndItsSectionExists() throws IOException {
        String methods = Files.readString(Path.of("src/docs/methods.md"));
        for (Source s : Sources.all()) {
            if (s.kind() == SourceKind.DERIVATION || s.kind() == SourceKind.COMMON_PRACTICE) {
                assertThat(s.document()).as(s.id()).contains("src/docs/methods.md");
                for (String section : s.locator().split(", ")) {
                    assertThat(methods).as(s.id() + " section " + section).contains("## " + section);
                }
            }
            if (s.kind() == SourceKind.COMMON_PRACTICE) {
                assertThat(s.checked()).as(s.id()).isEqualTo(SourceCheck.NOT_PUBLISHED);
            }
        }
    }

    @Test
    void everyExampleAnswerCitesCatalogueIdsAndNoTextSaysFromMemory() throws IOException {
        ObjectMapper mapper = new ObjectMapper();
        Set<String> ids = Sources.all().stream().map(Source::id).collect(Collectors.toSet());
        List<Path> answers;
        try (Stream<Path> files = Files.list(Path.of("api-examples"))) {
            answers = files.filter(p -> p.getFileName().toString().endsWith(".answer.json")).sorted().toList();
        }
        assertThat(answers).isNotEmpty();
        List<String> cited = new ArrayList<>();
        for (Path p : answers) {
            String text = Files.readString(p);
            assertThat(text).as(p.toString()).doesNotContainIgnoringCase("from memory");
            collectIds(mapper.readTree(text), cited);
        }
        assertThat(cited).isNotEmpty();
        assertThat(ids).containsAll(cited);
    }

    private static void collectIds(JsonNode node, List<String> out) {
        if (node.isObject()) {
            JsonNode refs = node.get("references");
            if (refs != null && refs.isArray()) {
                refs.forEach(r -> {
                    if (r.has("id")) {
                        out.add(r.get("id").asString());
                    }
                });
            }
            node.properties().forEach(e -> collectIds(e.getValue(), out));
        } else if (node.isArray()) {
            node.forEach(n -> collectIds(n, out));
        }
    }
}
