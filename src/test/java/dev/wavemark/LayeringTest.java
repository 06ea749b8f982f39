package dev.wavemark;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The package layering of DEVELOPERS.md: outer layers may use inner ones, never the reverse, and
 * the physics and inference know nothing of images, JSON or reports. Checked on the sources'
 * import and fully qualified references.
 */
class LayeringTest {
  private static final Path MAIN = Path.of("src/main/java/dev/wavemark");

  @ParameterizedTest(name = "{0} does not use {1}")
  @CsvSource({
      "core, boofcv|ij.|com.fasterxml|org.ddogleg|georegression|dev.wavemark.(imaging|files|report|pipeline|inference|cli)",
      "inference, boofcv|ij.|com.fasterxml|org.ddogleg|georegression|dev.wavemark.(imaging|files|report|pipeline|cli)",
      "imaging, com.fasterxml|dev.wavemark.(files|report|pipeline|inference|cli)",
      "files, boofcv|ij.|dev.wavemark.(imaging|report|pipeline|cli)",
      "report, dev.wavemark.(pipeline|cli)",
      "pipeline, dev.wavemark.cli"})
  void innerLayersDoNotReachOutwards(String pkg, String forbidden) throws IOException {
    java.util.regex.Pattern p = java.util.regex.Pattern.compile("(^import (static )?(" + forbidden + "))|[^\\w.](" + forbidden.replace("ij.", "ij\\.") + ")\\w*\\.[A-Z]");
    List<String> offenders = new ArrayList<>();
    Path dir = MAIN.resolve(pkg);
    try (Stream<Path> files = Files.walk(dir)) {
      for (Path f : (Iterable<Path>) files.filter(x -> x.toString().endsWith(".java"))::iterator) {
        int n = 0;
        for (String line : Files.readAllLines(f)) {
          n++;
          String t = line.strip();
          if (t.startsWith("*") || t.startsWith("//") || t.startsWith("/*")) {
            continue;
          }
          if (p.matcher(t).find()) {
            offenders.add(MAIN.relativize(f) + ":" + n + ": " + t);
          }
        }
      }
    }
    assertEquals(List.of(), offenders, pkg + " reaches outwards");
  }
}
