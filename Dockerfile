# Image of the congener command line, used by docker-compose.yml for the streams app and the trainer.
FROM maven:3.9-eclipse-temurin-17 AS build
WORKDIR /src
COPY . .
RUN mvn -B -q -DskipTests package -pl cli -am && touch cli/target/lib/.built

FROM eclipse-temurin:17-jre
WORKDIR /opt/congener
COPY --from=build /src/congener /opt/congener/congener
COPY --from=build /src/cli/target/classes /opt/congener/cli/target/classes
COPY --from=build /src/cli/target/lib /opt/congener/cli/target/lib
ENV CONGENER_JAVA_OPTS="-Xmx1g"
ENTRYPOINT ["/opt/congener/congener"]
