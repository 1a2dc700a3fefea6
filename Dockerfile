# Multi-stage build of the UT digitization calculation service.
# Build:  docker build -t ut-digitization-service .
# Run:    docker run --rm -p 8080:8080 ut-digitization-service
#
# Start-up: the jar is extracted (Spring Boot's jarmode tools) and a class data sharing (CDS)
# archive is written by a training run that starts the application context and exits; the
# service then starts from the archive (src/docs/performance.md: time to ready, plain and with CDS).
# Spring AOT is not used: it fixes at build time which beans exist, and this service decides some
# of them at run time from its configuration (JWT authentication, operator profile directory).

FROM maven:3.9-eclipse-temurin-17 AS build
WORKDIR /src
COPY pom.xml .
RUN mvn -B -q dependency:go-offline
COPY src ./src
RUN mvn -B -q -DskipTests package \
    && cp target/ut-digitization-service-*.jar /src/app.jar \
    && java -Djarmode=tools -jar /src/app.jar extract --destination /src/extracted \
    && mv /src/extracted/ut-digitization-service-*.jar /src/extracted/app.jar

FROM eclipse-temurin:17-jre
RUN groupadd --system app && useradd --system --gid app --home-dir /app --shell /usr/sbin/nologin app \
    && apt-get update && apt-get install -y --no-install-recommends curl && rm -rf /var/lib/apt/lists/*
WORKDIR /app
COPY --from=build /src/extracted/ /app/
# The training run: the same JVM and class path as the ENTRYPOINT, context refreshed, then exit.
RUN java -XX:ArchiveClassesAtExit=/app/app.jsa -Dspring.context.exit=onRefresh -jar /app/app.jar \
        --server.port=0 \
    && test -s /app/app.jsa
USER app
EXPOSE 8080
ENV JAVA_TOOL_OPTIONS="-XX:MaxRAMPercentage=75 -XX:+ExitOnOutOfMemoryError"
HEALTHCHECK --interval=15s --timeout=3s --start-period=30s --retries=3 \
    CMD curl -fsS http://127.0.0.1:8080/actuator/health || exit 1
# An archive that does not match the JVM is ignored with a warning (-Xshare:auto), never fatal.
ENTRYPOINT ["java", "-XX:SharedArchiveFile=/app/app.jsa", "-jar", "/app/app.jar"]
