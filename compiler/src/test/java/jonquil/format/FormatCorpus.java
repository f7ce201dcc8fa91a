package jonquil.format;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.lang.reflect.RecordComponent;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.stream.Stream;
import jonquil.source.SourceFile;
import jonquil.source.TextRange;
import jonquil.syntax.SpecFile;
import jonquil.syntax.SpecParser;
import jonquil.testing.Repo;

/** The specs the formatter is tried on, and the views of a spec that formatting must not change. */
final class FormatCorpus {
  private FormatCorpus() {}

  /** Every sample and every corpus spec that parses without syntax errors. */
  static List<Path> wellFormedSpecs() {
    List<Path> files = new ArrayList<>();
    try (Stream<Path> samples = Files.walk(Repo.samples());
        Stream<Path> corpus = Files.walk(Repo.testResources().resolve("diagnostics"))) {
      Stream.concat(samples, corpus)
          .filter(p -> p.toString().endsWith(".jonq"))
          .sorted()
          .forEach(files::add);
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
    return files.stream().filter(p -> !Formatter.hasSyntaxErrors(source(p))).toList();
  }

  static SourceFile source(Path file) {
    try {
      return new SourceFile(file, Files.readString(file, StandardCharsets.UTF_8));
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
  }

  static SourceFile source(String text) {
    return new SourceFile(Path.of("spec.jonq"), text);
  }

  /**
   * The syntax tree without positions and with all blanks (whitespace, and U+FEFF as the lexer
   * counts it) removed from its strings (a requirement keeps its source text): equal exactly when
   * formatting changed only layout.
   */
  static String tree(String text) {
    SpecFile ast = SpecParser.parse(source(text)).ast();
    return render(
        new SpecFile(
            ast.path(),
            ast.uses(),
            ast.declarations(),
            ast.trains(),
            ast.requires(),
            List.of(),
            List.of()));
  }

  /** Comment texts in order, as the parser found them, without trailing blanks. */
  static List<String> comments(String text) {
    SourceFile file = source(text);
    return SpecParser.parse(file).ast().comments().stream()
        .map(r -> WrittenToken.stripTrailingSpace(file.slice(r)))
        .toList();
  }

  private static String render(Object value) {
    if (value == null) {
      return "null";
    }
    if (value instanceof TextRange) {
      return "_";
    }
    if (value instanceof String s) {
      return '"' + s.replaceAll("[\\s\\uFEFF]+", "") + '"';
    }
    if (value instanceof Optional<?> o) {
      return o.map(FormatCorpus::render).orElse("none");
    }
    if (value instanceof List<?> list) {
      return list.stream().map(FormatCorpus::render).toList().toString();
    }
    if (value instanceof Record record) {
      StringBuilder out = new StringBuilder(record.getClass().getSimpleName()).append('(');
      for (RecordComponent c : record.getClass().getRecordComponents()) {
        try {
          out.append(c.getName())
              .append('=')
              .append(render(c.getAccessor().invoke(record)))
              .append(' ');
        } catch (ReflectiveOperationException e) {
          throw new IllegalStateException(e);
        }
      }
      return out.append(')').toString();
    }
    return String.valueOf(value);
  }
}
