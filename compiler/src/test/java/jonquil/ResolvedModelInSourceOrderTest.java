package jonquil;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import jonquil.resolve.ResolvedElement;
import jonquil.resolve.ResolvedModel;
import jonquil.resolve.Scope;
import jonquil.resolve.Value;
import org.junit.jupiter.api.Test;

/**
 * Every map of the resolved model iterates in source order (the root file, then the files it uses,
 * each by position), never in the order of a hash: the elements, each file's names, each element's
 * parameters and each value's slots. A hash order can differ from one JVM start to the next (the
 * JDK's immutable maps are salted per start), so the same listing is also taken in child JVMs and
 * must be the same bytes there.
 */
class ResolvedModelInSourceOrderTest {
  static final Path ROOT = Path.of("/virtual/order").toAbsolutePath();

  // Names whose hash order differs from the order they are written in.
  static final String MAIN =
      """
      use "parts.jonq"
      source zeta_laser {
        wavelength 633 nm
        power 1 mW
        beam waist 0.5 mm, m2 1.1
      }
      material quartz_like {
        cauchy 1.45, 0.0036 um2
        valid 400 nm .. 2 um
      }
      window mid_window {
        material quartz_like
        thickness 3 mm
      }
      dump alpha_dump
      train bench {
        zeta_laser -> 10 mm -> mid_window -> 10 mm -> alpha_dump
      }
      """;
  static final String PARTS =
      """
      material yellow_glass {
        cauchy 1.5, 0.004 um2
        valid 350 nm .. 1.1 um
      }
      dump kappa_dump
      material beta_glass {
        cauchy 1.6, 0.005 um2
      }
      """;

  /** The model's maps, one line per entry, in the order they iterate. */
  static String listing() {
    Path main = ROOT.resolve("main.jonq");
    Result r =
        Checker.check(
            Workspace.withOverlay(ROOT, Map.of(main, MAIN, ROOT.resolve("parts.jonq"), PARTS)),
            List.of(main));
    ResolvedModel model = r.models().get(main);
    StringBuilder out = new StringBuilder();
    model.scopes().forEach((path, scope) -> out.append(scopeLine(path, scope)));
    for (ResolvedElement e : model.elements().values()) {
      out.append("element ").append(e.symbol().name());
      e.params()
          .forEach(
              (name, groups) -> {
                out.append(' ').append(name);
                groups.forEach(g -> out.append(slots(g)));
              });
      out.append('\n');
    }
    return out.toString();
  }

  private static String scopeLine(Path path, Scope scope) {
    return "scope " + path.getFileName() + ": " + String.join(" ", scope.symbols().keySet()) + "\n";
  }

  private static String slots(Value.Group g) {
    StringBuilder s = new StringBuilder("{");
    g.slots()
        .forEach(
            (k, v) -> s.append(' ').append(k).append(v instanceof Value.Group in ? slots(in) : ""));
    g.items().forEach(i -> s.append(slots(i)));
    return s.append(" }").toString();
  }

  static final String IN_SOURCE_ORDER =
      """
      scope main.jonq: zeta_laser quartz_like mid_window alpha_dump bench yellow_glass kappa_dump \
      beta_glass
      scope parts.jonq: yellow_glass kappa_dump beta_glass
      element zeta_laser wavelength{ wavelength } power{ power } beam{ waist m2 }
      element quartz_like cauchy{ a b } valid{ from..to{ low high } }
      element mid_window material{ material } thickness{ thickness }
      element alpha_dump
      element yellow_glass cauchy{ a b } valid{ from..to{ low high } }
      element kappa_dump
      element beta_glass cauchy{ a b }
      """;

  @Test
  void everyMapOfTheModelIteratesInSourceOrder() {
    assertEquals(IN_SOURCE_ORDER, listing());
  }

  @Test
  void childJvmsListTheModelInTheSameOrder() throws Exception {
    String here = listing();
    for (int run = 0; run < 3; run++) {
      assertEquals(here, inChildJvm(), "child JVM " + run);
    }
  }

  public static void main(String[] args) {
    System.out.print(listing());
  }

  private static String inChildJvm() throws Exception {
    List<String> command = new ArrayList<>();
    command.add(ProcessHandle.current().info().command().orElseThrow());
    command.add("-cp");
    command.add(System.getProperty("java.class.path"));
    command.add(ResolvedModelInSourceOrderTest.class.getName());
    Process p = new ProcessBuilder(command).redirectErrorStream(true).start();
    byte[] out = p.getInputStream().readAllBytes();
    if (!p.waitFor(60, TimeUnit.SECONDS)) {
      p.destroyForcibly();
      throw new AssertionError("the child JVM did not finish");
    }
    return new String(out, StandardCharsets.UTF_8);
  }
}
