package org.assay;

import static com.tngtech.archunit.base.DescribedPredicate.describe;
import static com.tngtech.archunit.core.domain.JavaClass.Predicates.resideInAnyPackage;
import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;

import com.tngtech.archunit.core.domain.JavaClass;
import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import com.tngtech.archunit.lang.ArchRule;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * What assay's own classes may never do, checked on the compiled production classes (target/classes) with
 * ArchUnit: assay reads files other people wrote (claims, templates, PDFs, audit files), so no code path may
 * reach the network, start a program, evaluate a script, look template names up by reflection, or turn
 * bytes into Java objects by class name. The libraries are trusted to the extent the rules below pin down
 * how they are used (Mustache through map lookups only; YAML and JSON as trees, never bound to classes
 * named in the file).
 *
 * <p>How the rules were checked: a throw-away production class org.assay.cli.Sabotage that opened a
 * Socket, called URL.openStream and HttpClient.newHttpClient, built a ProcessBuilder and called
 * Runtime.exec, made a ScriptEngineManager, used ReflectionObjectHandler, called Class.forName and
 * Method.invoke, read an ObjectInputStream, made a SnakeYAML {@code Yaml} and called
 * ObjectMapper.activateDefaultTyping made every rule below fail, each naming the line; it was then deleted.
 */
class ArchitectureRulesTest {
    private static JavaClasses production;

    @BeforeAll
    static void importProductionClasses() {
        production = new ClassFileImporter()
                .withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
                .withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_JARS)
                .importPackages("org.assay");
        // the rules below are only as good as the import: production classes in, test classes out
        org.assertj.core.api.Assertions.assertThat(production.contain("org.assay.cli.Main")).isTrue();
        org.assertj.core.api.Assertions.assertThat(production.contain("org.assay.cli.Rerun")).isTrue();
        org.assertj.core.api.Assertions.assertThat(production.contain(ArchitectureRulesTest.class)).isFalse();
    }

    /** Networking: sockets, URL connections, the HTTP client, SSL. No exception: assay works offline. */
    @Test
    void noProductionClassReachesTheNetwork() {
        ArchRule rule = noClasses().should().dependOnClassesThat(resideInAnyPackage(
                        "java.net..", "javax.net..", "java.net.http..", "jdk.net..", "sun.net..", "java.rmi..", "javax.naming.."))
                .orShould().dependOnClassesThat(describe("socket channels", (JavaClass c) ->
                        c.getName().startsWith("java.nio.channels.") && c.getSimpleName().contains("Socket")))
                .because("assay reads local files only; a claims file, template or PDF must never make it connect anywhere");
        rule.check(production);
    }

    /**
     * Processes: only {@code assay audit --rerun} (org.assay.cli.Rerun) starts one, a new JVM running assay
     * itself on the arguments recorded in a report.json, so that relative paths resolve in the recorded
     * working directory.
     */
    @Test
    void onlyTheRerunStartsAProcess() {
        ArchRule rule = noClasses().that(describe("are not org.assay.cli.Rerun", (JavaClass c) ->
                        !c.getName().equals("org.assay.cli.Rerun") && !c.getName().startsWith("org.assay.cli.Rerun$")))
                .should().dependOnClassesThat().areAssignableTo(ProcessBuilder.class)
                .orShould().callMethodWhere(describe("Runtime.exec", call ->
                        call.getTarget().getName().equals("exec") && call.getTargetOwner().isEquivalentTo(Runtime.class)))
                .orShould().dependOnClassesThat().areAssignableTo(ProcessHandle.class)
                .because("a value in an input file must never become a command; only audit --rerun starts a JVM running assay");
        rule.check(production);
    }

    /** Script and expression engines, by package; none is on assay's class path either. */
    @Test
    void noScriptingEngine() {
        ArchRule rule = noClasses().should().dependOnClassesThat(resideInAnyPackage("javax.script..", "jdk.nashorn..",
                        "org.openjdk.nashorn..", "org.graalvm..", "groovy..", "org.codehaus.groovy..", "org.mozilla.javascript..",
                        "bsh..", "org.mvel2..", "ognl..", "org.springframework.expression..", "javax.el..", "jakarta.el..",
                        "org.apache.commons.jexl3..", "org.apache.velocity..", "freemarker.."))
                .because("nothing a user hands assay is ever evaluated as code");
        rule.check(production);
    }

    /**
     * Templates: mustache.java resolves {@code {{name}}} through an object handler; the reflection-based ones
     * (ReflectionObjectHandler, SimpleObjectHandler and their guards and wrappers) call getters and methods
     * of whatever object is in scope. Only MapObjectHandler, which looks names up as map keys, may be used
     * (TemplateRenderer), and no production class uses Java reflection or loads a class by name itself.
     */
    @Test
    void templatesAndEverythingElseResolveNamesWithoutReflection() {
        ArchRule mustache = noClasses().should().dependOnClassesThat(describe(
                        "mustache.java's reflection-based object handlers and wrappers", (JavaClass c) ->
                                c.getPackageName().startsWith("com.github.mustachejava.reflect")
                                        && !c.getName().equals("com.github.mustachejava.reflect.MapObjectHandler")))
                .orShould().dependOnClassesThat().haveFullyQualifiedName("com.github.mustachejava.TemplateFunction")
                .because("a template may look up map keys only: no getters, no methods, no functions");
        mustache.check(production);
        ArchRule reflection = noClasses().should().dependOnClassesThat(resideInAnyPackage("java.lang.reflect.."))
                .orShould().callMethodWhere(describe("Class.forName or ClassLoader.loadClass", call ->
                        (call.getTarget().getName().equals("forName") && call.getTargetOwner().isEquivalentTo(Class.class))
                                || (call.getTarget().getName().equals("loadClass")
                                        && call.getTargetOwner().isAssignableTo(ClassLoader.class))))
                .because("no name read from an input file may select a class or a method");
        reflection.check(production);
    }

    /**
     * Deserialization: Java serialization, XMLDecoder, SnakeYAML's object constructor (which builds any
     * class a {@code !!tag} names) and Jackson's polymorphic default typing (which does the same for a
     * class name in the JSON). assay reads YAML through SnakeYAML's node API and Jackson trees.
     */
    @Test
    void noDeserializationOfClassesNamedInTheInput() {
        ArchRule rule = noClasses().should().dependOnClassesThat().areAssignableTo(java.io.ObjectInputStream.class)
                .orShould().dependOnClassesThat().haveFullyQualifiedName("java.beans.XMLDecoder")
                .orShould().dependOnClassesThat().haveFullyQualifiedName("org.yaml.snakeyaml.Yaml")
                .orShould().dependOnClassesThat(resideInAnyPackage("org.yaml.snakeyaml.constructor.."))
                .orShould().callMethodWhere(describe("Jackson's default typing", call ->
                        call.getTarget().getName().matches("(activate|enable)DefaultTyping.*")))
                .orShould().dependOnClassesThat().haveFullyQualifiedName("com.fasterxml.jackson.annotation.JsonTypeInfo")
                .because("a claims, audit or report file is data; it never names a Java class to build");
        rule.check(production);
    }
}
