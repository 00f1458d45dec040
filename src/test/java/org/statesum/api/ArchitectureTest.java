package org.statesum.api;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * The layering, read from the source files: dependencies point api -> models -> engine, units is used
 * by all and uses none of them, only api touches HTTP and JSON, and every package documents itself in
 * a package-info.java.
 */
class ArchitectureTest {

    private static final Path MAIN = Path.of("src", "main", "java", "org", "statesum");
    /** A reference to a package, in an import or written out in full in the code. */
    private static final Pattern REFERENCE = Pattern.compile(
            "\\b(io\\.javalin|com\\.fasterxml\\.jackson|org\\.statesum\\.(?:api|models|engine|units))\\b");

    /** Source files by top-level package under org.statesum. */
    private static Map<String, List<Path>> sources() {
        Map<String, List<Path>> byPackage = new TreeMap<>();
        try (Stream<Path> files = Files.walk(MAIN)) {
            files.filter(p -> p.toString().endsWith(".java")).forEach(p -> byPackage
                    .computeIfAbsent(MAIN.relativize(p).getName(0).toString(), k -> new ArrayList<>()).add(p));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return byPackage;
    }

    /** "file: reference" for every reference from {@code pkg} to one of {@code forbidden}. */
    private static List<String> references(String pkg, List<String> forbidden) {
        List<String> found = new ArrayList<>();
        for (Path file : sources().getOrDefault(pkg, List.of())) {
            try {
                Matcher m = REFERENCE.matcher(Files.readString(file));
                while (m.find()) {
                    if (forbidden.contains(m.group(1))) {
                        found.add(MAIN.relativize(file) + ": " + m.group(1));
                    }
                }
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        }
        return found;
    }

    @Test
    void theFourPackagesExist() {
        assertTrue(sources().keySet().containsAll(List.of("api", "engine", "models", "units")), "" + sources().keySet());
    }

    @Test
    void onlyApiTouchesHttpAndJson() {
        for (String pkg : sources().keySet()) {
            if (!pkg.equals("api")) {
                assertEquals(List.of(), references(pkg, List.of("io.javalin", "com.fasterxml.jackson")), pkg);
            }
        }
    }

    @Test
    void engineUsesNeitherModelsNorApi() {
        assertEquals(List.of(), references("engine", List.of("org.statesum.models", "org.statesum.api")));
    }

    @Test
    void modelsDoNotUseApi() {
        assertEquals(List.of(), references("models", List.of("org.statesum.api")));
    }

    @Test
    void unitsUseNoOtherPackage() {
        assertEquals(List.of(), references("units",
                List.of("org.statesum.api", "org.statesum.models", "org.statesum.engine")));
    }

    @Test
    void everyPackageHasAPackageInfo() throws IOException {
        List<String> missing = new ArrayList<>();
        try (Stream<Path> dirs = Files.walk(MAIN)) {
            dirs.filter(Files::isDirectory).forEach(dir -> {
                try (Stream<Path> files = Files.list(dir)) {
                    boolean hasSources = files.anyMatch(p -> p.toString().endsWith(".java"));
                    if (hasSources && !Files.exists(dir.resolve("package-info.java"))) {
                        missing.add(MAIN.relativize(dir).toString());
                    }
                } catch (IOException e) {
                    throw new UncheckedIOException(e);
                }
            });
        }
        assertEquals(List.of(), missing);
    }
}
