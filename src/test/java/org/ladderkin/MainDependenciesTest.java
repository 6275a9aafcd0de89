package org.ladderkin;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * Every Hipparchus module packed into the jar (compile scope in pom.xml) is imported by some main source file: a
 * module only tests use belongs in test scope, and one nobody uses is dropped.
 */
class MainDependenciesTest {

    private static final Path HOME = Path.of(System.getProperty("ladderkin.home", "."));
    private static final Pattern DEPENDENCY = Pattern.compile("<dependency>(.*?)</dependency>", Pattern.DOTALL);
    private static final Pattern ARTIFACT = Pattern.compile("<artifactId>hipparchus-([a-z]+)</artifactId>");

    static List<String> compileScopeHipparchusModules(String pom) {
        List<String> modules = new ArrayList<>();
        Matcher d = DEPENDENCY.matcher(pom);
        while (d.find()) {
            Matcher a = ARTIFACT.matcher(d.group(1));
            if (a.find() && !d.group(1).contains("<scope>test</scope>")) {
                modules.add(a.group(1));
            }
        }
        return modules;
    }

    @Test
    void everyPackedHipparchusModuleIsImportedByMainCode() throws IOException {
        String pom = Files.readString(HOME.resolve("pom.xml"));
        List<String> modules = compileScopeHipparchusModules(pom);
        assertThat(modules).contains("core");
        StringBuilder imports = new StringBuilder();
        try (Stream<Path> files = Files.walk(HOME.resolve("src/main/java"))) {
            for (Path f : files.filter(p -> p.toString().endsWith(".java")).toList()) {
                for (String line : Files.readAllLines(f)) {
                    if (line.startsWith("import org.hipparchus.")) {
                        imports.append(line).append('\n');
                    }
                }
            }
        }
        for (String module : modules) {
            // hipparchus-core holds the root packages (linear, util, special ...), every other module its own package
            String pattern = module.equals("core") ? "import org.hipparchus." : "import org.hipparchus." + module + ".";
            assertThat(imports.toString()).as("a main import from hipparchus-" + module).contains(pattern);
        }
    }

    @Test
    void theScopeReaderSeesTestScope() {
        String pom = "<dependency><artifactId>hipparchus-optim</artifactId></dependency>"
                + "<dependency><artifactId>hipparchus-ode</artifactId><scope>test</scope></dependency>";
        assertThat(compileScopeHipparchusModules(pom)).containsExactly("optim");
    }
}
