package utdigit.reliability;

import static io.restassured.RestAssured.given;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import io.restassured.http.ContentType;
import java.io.IOException;
import java.net.ConnectException;
import java.net.Socket;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.springframework.boot.builder.SpringApplicationBuilder;
import org.springframework.boot.web.server.context.WebServerApplicationContext;
import org.springframework.context.ConfigurableApplicationContext;
import utdigit.UtDigitizationApplication;
import utdigit.web.support.ApiTest;

/**
 * The service is stateless: a second instance started fresh gives the same answers, stamp sha256
 * for stamp sha256, as the instance that has been serving all along, and so do many concurrent
 * callers. Shutdown is graceful: a request in flight is answered, new connections are refused.
 */
class RestartAndShutdownTest extends ApiTest {
    static final String QUANTIZATION = "/api/quantization-assessments";

    @org.springframework.beans.factory.annotation.Autowired
    utdigit.web.pipeline.CalculationRunner runner;

    /** The example request of every calculation (api-examples/<calculation>.json), and some of ours. */
    List<String[]> requests() throws IOException {
        List<String[]> requests = new ArrayList<>();
        try (Stream<Path> files = Files.list(Path.of("api-examples"))) {
            // the request examples of the stamped calculations, named after their endpoint (the OpenAPI
            // document is no request; a stamp verification's answer carries no stamp of its own)
            for (Path f : files.filter(p -> p.toString().endsWith(".json") && !p.toString().endsWith(".answer.json")
                            && !p.getFileName().toString().equals("openapi.json")
                            && !p.getFileName().toString().equals("stamp-verifications.json"))
                    .sorted().toList()) {
                String name = f.getFileName().toString().replace(".json", "");
                if (runner.names().contains(name)) {
                    requests.add(new String[] {"/api/" + name, Files.readString(f)});
                }
            }
        }
        for (int bits = 1; bits <= 32; bits++) {
            requests.add(new String[] {QUANTIZATION, "{\"bit_depth\": " + bits + ", \"signal_height_percent_fsh\": 37.5, "
                    + "\"amplitude_tolerance_db\": 0.5, \"reference_height_percent_fsh\": 80, \"evaluation_level_db\": -14}"});
        }
        return requests;
    }

    static List<String> stamps(int port, List<String[]> requests) {
        List<String> stamps = new ArrayList<>();
        for (String[] r : requests) {
            stamps.add(given().port(port).contentType(ContentType.JSON).body(r[1]).post(r[0]).then().statusCode(200)
                    .extract().path("stamp.sha256"));
        }
        return stamps;
    }

    @Test
    void freshInstanceGivesTheSameStampsAndShutsDownGracefully() throws Exception {
        List<String[]> requests = requests();
        List<String> serving = stamps(port, requests);
        ConfigurableApplicationContext fresh = new SpringApplicationBuilder(UtDigitizationApplication.class)
                .run("--server.port=0");
        int freshPort = ((WebServerApplicationContext) fresh).getWebServer().getPort();
        try {
            List<String> restarted = stamps(freshPort, requests);
            System.out.printf("Restart: %d requests, %d stamps equal across two instances%n", requests.size(),
                    java.util.stream.IntStream.range(0, serving.size()).filter(i -> serving.get(i).equals(restarted.get(i))).count());
            assertThat(restarted).isEqualTo(serving);

            // A request in flight (its body half sent) when shutdown starts is still answered.
            String body = "{\"bit_depth\": 8}";
            try (RawHttp inFlight = new RawHttp(freshPort, 20_000)) {
                inFlight.head("POST", QUANTIZATION, Map.of("Content-Type", "application/json",
                        "Content-Length", Integer.toString(body.length())));
                inFlight.send(body.substring(0, 4).getBytes(StandardCharsets.US_ASCII));
                Thread.sleep(200);
                CompletableFuture<Void> closing = CompletableFuture.runAsync(fresh::close);
                Thread.sleep(1000);
                assertThat(closing).as("shutdown waits for the request in flight").isNotDone();
                assertThatThrownBy(() -> new Socket(RawHttp.LOOPBACK, freshPort).close())
                        .as("new connections are refused during shutdown").isInstanceOf(ConnectException.class);
                inFlight.send(body.substring(4).getBytes(StandardCharsets.US_ASCII));
                RawHttp.Answer a = inFlight.read();
                assertThat(a.status()).isEqualTo(200);
                assertThat(a.body()).contains("\"levels\":256");
                closing.get(30, TimeUnit.SECONDS);
            }
        } finally {
            fresh.close();
        }
    }

    @Test
    void concurrentCallersGetTheStampsOfSequentialOnes() throws Exception {
        List<String[]> requests = requests();
        List<String> sequential = stamps(port, requests);
        ExecutorService pool = Executors.newFixedThreadPool(16);
        try {
            List<Future<String>> futures = new ArrayList<>();
            for (int round = 0; round < 5; round++) {
                for (String[] r : requests) {
                    futures.add(pool.submit(() -> given().port(port).contentType(ContentType.JSON).body(r[1]).post(r[0])
                            .then().statusCode(200).extract().<String>path("stamp.sha256")));
                }
            }
            int differences = 0;
            for (int i = 0; i < futures.size(); i++) {
                if (!futures.get(i).get(60, TimeUnit.SECONDS).equals(sequential.get(i % requests.size()))) {
                    differences++;
                }
            }
            System.out.printf("Concurrency determinism: %d requests on 16 threads, %d stamps differ from the "
                    + "sequential run%n", futures.size(), differences);
            assertThat(differences).isZero();
        } finally {
            pool.shutdownNow();
        }
    }
}
