package org.holdfast;

import static com.tngtech.archunit.base.DescribedPredicate.not;
import static com.tngtech.archunit.core.domain.JavaClass.Predicates.resideInAPackage;
import static com.tngtech.archunit.core.domain.JavaClass.Predicates.resideInAnyPackage;
import static com.tngtech.archunit.library.Architectures.layeredArchitecture;
import static com.tngtech.archunit.library.dependencies.SlicesRuleDefinition.slices;

import com.tngtech.archunit.core.importer.ImportOption;
import com.tngtech.archunit.junit.AnalyzeClasses;
import com.tngtech.archunit.junit.ArchTest;
import com.tngtech.archunit.lang.ArchRule;

/**
 * The engine's layers, checked on the compiled classes (tests excluded): no package depends on
 * itself through others, and dependencies point down only.
 * <pre>
 *   commands   cli                                  (nothing depends on it)
 *   domain     every other package                  (cycle-free among themselves)
 *   base       schema, units, bench (the suite SPI)  (depends on no domain package)
 * </pre>
 * A new package is domain unless it is added to base or commands here.
 */
@AnalyzeClasses(packages = "org.holdfast",
        importOptions = {ImportOption.DoNotIncludeTests.class, ImportOption.DoNotIncludeJars.class})
class ArchitectureTest {

    static final String[] BASE = {"org.holdfast.schema..", "org.holdfast.units..", "org.holdfast.bench.."};
    static final String[] COMMANDS = {"org.holdfast.cli.."};

    /** Each package is its own slice: sweep and sweep.spark may not depend on each other both ways. */
    @ArchTest
    static final ArchRule packagesAreFreeOfCycles = slices().matching("org.holdfast.(**)")
            .should().beFreeOfCycles();

    @ArchTest
    static final ArchRule layersPointDown = layeredArchitecture()
            .consideringOnlyDependenciesInLayers()
            .layer("base").definedBy(BASE)
            .layer("domain").definedBy(resideInAPackage("org.holdfast..")
                    .and(not(resideInAnyPackage(BASE))).and(not(resideInAnyPackage(COMMANDS))))
            .layer("commands").definedBy(COMMANDS)
            .whereLayer("commands").mayNotBeAccessedByAnyLayer()
            .whereLayer("domain").mayOnlyBeAccessedByLayers("commands")
            .whereLayer("base").mayOnlyBeAccessedByLayers("domain", "commands");
}
