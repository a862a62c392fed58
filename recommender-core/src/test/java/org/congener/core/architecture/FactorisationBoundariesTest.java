package org.congener.core.architecture;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import org.junit.jupiter.api.Test;

/**
 * Boundaries of the factorisation side of the math module (DEVELOPERS.md): no Kafka or RocksDB, and
 * no import of the ontology code — fusion meets it only through {@code ItemSimilarity} and
 * {@code NeighbourLists}.
 */
class FactorisationBoundariesTest {
    private static final String[] OURS = {"org.congener.core.interactions..", "org.congener.core.factorisation..",
        "org.congener.core.fusion..", "org.congener.core.metrics..", "org.congener.core.split.."};
    private static final JavaClasses CLASSES = new ClassFileImporter()
            .withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
            .importPackages("org.congener.core");

    @Test
    void shouldNotUseKafkaOrRocksDbInTheFactorisationPackages() {
        noClasses().that().resideInAnyPackage(OURS)
                .should().dependOnClassesThat().resideInAnyPackage("org.apache.kafka..", "org.rocksdb..")
                .allowEmptyShould(true)
                .check(CLASSES);
    }

    @Test
    void shouldNotImportTheOntologyCodeFromTheFactorisationPackages() {
        noClasses().that().resideInAnyPackage(OURS)
                .should().dependOnClassesThat().resideInAPackage("org.congener.core.ontology..")
                .allowEmptyShould(true)
                .check(CLASSES);
    }

    @Test
    void shouldKeepFactorisationFreeOfFusion() {
        noClasses().that().resideInAPackage("org.congener.core.factorisation..")
                .should().dependOnClassesThat().resideInAPackage("org.congener.core.fusion..")
                .check(CLASSES);
    }
}
