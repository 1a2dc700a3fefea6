package utdigit.architecture;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;

import com.tngtech.archunit.core.importer.ImportOption;
import com.tngtech.archunit.junit.AnalyzeClasses;
import com.tngtech.archunit.junit.ArchTest;
import com.tngtech.archunit.lang.ArchRule;

/** The calculation core knows no framework: it can be used, tested and benchmarked alone. */
@AnalyzeClasses(packages = "utdigit", importOptions = ImportOption.DoNotIncludeTests.class)
class CorePurityTest {

    @ArchTest
    static final ArchRule coreImportsNoFramework = noClasses()
            .that().resideInAPackage("utdigit.core..")
            .should().dependOnClassesThat().resideInAnyPackage(
                    "org.springframework..", "tools.jackson..", "com.fasterxml..",
                    "jakarta..", "javax.servlet..", "io.swagger..", "org.springdoc..")
            .because("the core must stay a plain library (DEVELOPERS.md: the core is pure)");

    @ArchTest
    static final ArchRule coreDoesNotDependOnWeb = noClasses()
            .that().resideInAPackage("utdigit.core..")
            .should().dependOnClassesThat().resideInAPackage("utdigit.web..")
            .because("the web layer depends on the core, never the reverse");
}
