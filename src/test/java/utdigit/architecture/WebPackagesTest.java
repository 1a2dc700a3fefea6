package utdigit.architecture;

import static com.tngtech.archunit.core.domain.JavaClass.Predicates.resideInAPackage;
import static com.tngtech.archunit.core.domain.JavaClass.Predicates.resideOutsideOfPackage;
import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;
import static com.tngtech.archunit.library.dependencies.SlicesRuleDefinition.slices;

import com.tngtech.archunit.core.importer.ImportOption;
import com.tngtech.archunit.junit.AnalyzeClasses;
import com.tngtech.archunit.junit.ArchTest;
import com.tngtech.archunit.lang.ArchRule;

/** The web layer's packages, one per concern or feature, depend on each other without a cycle. */
@AnalyzeClasses(packages = "utdigit", importOptions = ImportOption.DoNotIncludeTests.class)
class WebPackagesTest {

    @ArchTest
    static final ArchRule webPackagesAreFreeOfCycles = slices()
            .matching("utdigit.web.(*)..")
            .should().beFreeOfCycles();

    @ArchTest
    static final ArchRule stampDependsOnNoOtherWebPackage = noClasses()
            .that().resideInAPackage("utdigit.web.stamp..")
            .should().dependOnClassesThat(resideInAPackage("utdigit.web..")
                    .and(resideOutsideOfPackage("utdigit.web.stamp..")))
            .because("a stamp is computed and checked the same way whatever produced the answer");
}
