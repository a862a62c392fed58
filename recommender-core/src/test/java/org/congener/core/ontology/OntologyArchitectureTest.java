package org.congener.core.ontology;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;

import com.tngtech.archunit.base.DescribedPredicate;
import com.tngtech.archunit.core.domain.JavaClass;
import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import org.junit.jupiter.api.Test;

/**
 * The ontology code stands alone: no Kafka, no RocksDB, no other recommender-core package (factorisation,
 * fusion, metrics, ...). The streams app and the trainer depend on it, never the other way round.
 */
class OntologyArchitectureTest {

    private static final DescribedPredicate<JavaClass> FORBIDDEN = DescribedPredicate.describe(
            "are in Kafka, RocksDB or a recommender-core package outside the ontology", target -> {
                String name = target.getPackageName();
                return name.startsWith("org.apache.kafka") || name.startsWith("org.rocksdb")
                        || (name.startsWith("org.congener.core")
                        && !name.equals("org.congener.core.ontology")
                        && !name.startsWith("org.congener.core.ontology."));
            });

    private final JavaClasses coreClasses = new ClassFileImporter()
            .withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
            .importPackages("org.congener.core");

    @Test
    void shouldNotDependOnKafkaRocksDbOrOtherCorePackages() {
        noClasses().that().resideInAPackage("org.congener.core.ontology..")
                .should().dependOnClassesThat(FORBIDDEN)
                .check(coreClasses);
    }
}
