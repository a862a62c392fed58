package org.congener.streams;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/** Keeps the streams app's packages to one job each, so that parts (the scorer above all) can be swapped. */
class PackageBoundariesTest {

    private static JavaClasses classes;

    @BeforeAll
    static void importClasses() {
        classes = new ClassFileImporter().withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
                .importPackages("org.congener.streams");
    }

    @Test
    void shouldKeepScoringFreeOfKafkaWhenScorersAreSwapped() {
        noClasses().that().resideInAPackage("org.congener.streams.scoring..")
                .should().dependOnClassesThat().resideInAnyPackage("org.apache.kafka..", "org.rocksdb..",
                        "org.congener.streams.processor..", "org.congener.streams.api..")
                .check(classes);
    }

    @Test
    void shouldKeepHttpInsideTheApiPackage() {
        noClasses().that().resideOutsideOfPackage("org.congener.streams.api..")
                .should().dependOnClassesThat().resideInAnyPackage("com.sun.net.httpserver..", "java.net.http..")
                .check(classes);
    }

    @Test
    void shouldKeepStateFormatsFreeOfJson() {
        noClasses().that().resideInAPackage("org.congener.streams.state..")
                .should().dependOnClassesThat().resideInAnyPackage("com.fasterxml.jackson..")
                .check(classes);
    }
}
