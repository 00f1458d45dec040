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
 * by all and uses none of them, only api touches HTTP and JSON, every package documents itself in a
 * package-info.java, and inside api each room imports only the rooms its row below allows (endpoint
 * rooms never one another; the server machinery no endpoint).
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

    private static final Path API = MAIN.resolve("api");
    private static final Pattern API_REFERENCE = Pattern.compile("\\borg\\.statesum\\.api\\.([a-z]+)\\.");
    /** The rooms of api and the rooms each may import; the assembly (api itself) may import every room. */
    private static final Map<String, List<String>> ROOM_IMPORTS = Map.ofEntries(
            Map.entry("config", List.of()),
            Map.entry("request", List.of("config")),
            Map.entry("server", List.of("config", "request")),
            Map.entry("species", List.of("config", "request")),
            Map.entry("spectrum", List.of("config", "request", "species")),
            Map.entry("gas", List.of("config", "request", "species")),
            Map.entry("solid", List.of("config", "request", "species")),
            Map.entry("reaction", List.of("config", "request", "species")),
            Map.entry("ensemble", List.of("config", "request", "species")),
            Map.entry("ranking", List.of("config", "request", "species")),
            Map.entry("sampled", List.of("config", "request", "species")),
            Map.entry("constants", List.of("config", "request", "species")),
            Map.entry("batch", List.of("config", "request", "species", "server")));

    @Test
    void everyApiRoomImportsOnlyWhatItsRowAllows() throws IOException {
        List<String> found = new ArrayList<>();
        List<String> rooms = new ArrayList<>();
        try (Stream<Path> files = Files.walk(API)) {
            for (Path file : files.filter(p -> p.toString().endsWith(".java")).toList()) {
                Path relative = API.relativize(file);
                if (relative.getNameCount() == 1) {
                    continue; // the assembly
                }
                String room = relative.getName(0).toString();
                rooms.add(room);
                List<String> allowed = ROOM_IMPORTS.get(room);
                if (allowed == null) {
                    found.add(relative + ": a room missing from ROOM_IMPORTS (add its row)");
                    continue;
                }
                Matcher m = API_REFERENCE.matcher(Files.readString(file));
                while (m.find()) {
                    if (!m.group(1).equals(room) && !allowed.contains(m.group(1))) {
                        found.add(relative + ": " + m.group(1));
                    }
                }
            }
        }
        assertEquals(List.of(), found);
        assertTrue(rooms.containsAll(ROOM_IMPORTS.keySet()), "every room in the table exists: " + rooms);
    }

    @Test
    void testsMirrorTheApiRooms() throws IOException {
        Path tests = Path.of("src", "test", "java", "org", "statesum", "api");
        List<String> strays = new ArrayList<>();
        try (Stream<Path> files = Files.walk(tests)) {
            files.filter(p -> p.toString().endsWith(".java")).map(tests::relativize)
                    .filter(p -> p.getNameCount() > 1 && !ROOM_IMPORTS.containsKey(p.getName(0).toString()))
                    .forEach(p -> strays.add(p.toString()));
        }
        assertEquals(List.of(), strays, "test folders under api name rooms of the main code");
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
