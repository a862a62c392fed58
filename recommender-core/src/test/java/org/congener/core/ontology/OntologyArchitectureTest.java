package org.congener.core.ontology;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import org.junit.jupiter.api.Test;

/** The ontology code stands alone: no Kafka, no RocksDB, no other recommender-core package. */
class OntologyArchitectureTest {

    private final JavaClasses ontologyClasses = new ClassFileImporter()
            .withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
            .importPackages("org.congener.core");

    @Test
    void shouldNotDependOnKafkaRocksDbOrOtherCorePackages() {
        noClasses().that().resideInAPackage("org.congener.core.ontology..")
                .should().dependOnClassesThat(com.tngtech.archunit.base.DescribedPredicate.describe(
                        "Kafka, RocksDB or recommender-core outside the ontology",
                        (com.tngtech.archunit.core.domain.JavaClass target) -> {
                            String name = target.getPackageName();
                            return name.startsWith("org.apache.kafka") || name.startsWith("org.rocksdb")
                                    || (name.startsWith("org.congener.core")
                                    && !name.equals("org.congener.core.ontology")
                                    && !name.startsWith("org.congener.core.ontology."));
                        }))
                .check(ontologyClasses);
    }
}
