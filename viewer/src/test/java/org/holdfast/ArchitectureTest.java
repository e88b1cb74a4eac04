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
 * The layers of the whole program (the viewer's classes and the engine's they use), checked on
 * the compiled classes in folders (tests and jars left out: where Maven hands over the engine as a
 * jar, the engine's own ArchitectureTest has checked it): no package depends on itself through
 * others, and dependencies point down only.
 * <pre>
 *   commands   cli, viewer (HoldfastFull, ViewCommand)
 *   pictures   render, replay, film, window (and their subpackages)
 *   domain     every other engine package
 *   base       schema, units, bench (the suite SPI)
 * </pre>
 * Base and domain may be empty here: where Maven hands the engine over as a jar (verify), only
 * the viewer's classes are imported, and their dependencies on the engine are still checked.
 * A new viewer package belongs in PICTURES here; any other new package is domain.
 */
@AnalyzeClasses(packages = "org.holdfast",
        importOptions = {ImportOption.DoNotIncludeTests.class, ImportOption.DoNotIncludeJars.class})
class ArchitectureTest {

    static final String[] BASE = {"org.holdfast.schema..", "org.holdfast.units..", "org.holdfast.bench.."};
    static final String[] PICTURES = {"org.holdfast.render..", "org.holdfast.replay..", "org.holdfast.film..",
        "org.holdfast.window.."};
    static final String[] COMMANDS = {"org.holdfast.cli..", "org.holdfast.viewer.."};

    /** Each package is its own slice: window and window.gl may not depend on each other both ways. */
    @ArchTest
    static final ArchRule packagesAreFreeOfCycles = slices().matching("org.holdfast.(**)")
            .should().beFreeOfCycles();

    @ArchTest
    static final ArchRule layersPointDown = layeredArchitecture()
            .consideringOnlyDependenciesInLayers()
            .optionalLayer("base").definedBy(BASE)
            .optionalLayer("domain").definedBy(resideInAPackage("org.holdfast..").and(not(resideInAnyPackage(BASE)))
                    .and(not(resideInAnyPackage(PICTURES))).and(not(resideInAnyPackage(COMMANDS))))
            .layer("pictures").definedBy(PICTURES)
            .layer("commands").definedBy(COMMANDS)
            .whereLayer("commands").mayNotBeAccessedByAnyLayer()
            .whereLayer("pictures").mayOnlyBeAccessedByLayers("commands")
            .whereLayer("domain").mayOnlyBeAccessedByLayers("pictures", "commands")
            .whereLayer("base").mayOnlyBeAccessedByLayers("domain", "pictures", "commands");
}
