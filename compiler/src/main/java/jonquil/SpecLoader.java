package jonquil;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import jonquil.diag.Diagnostic;
import jonquil.diag.DiagnosticCode;
import jonquil.resolve.UseEdge;
import jonquil.source.SourceFile;
import jonquil.source.TextRange;
import jonquil.syntax.ParseResult;
import jonquil.syntax.SpecFile;
import jonquil.syntax.SpecParser;
import jonquil.syntax.UseDecl;

/**
 * Reads a root file and every file it brings in with 'use', parsing each once, and reports missing
 * files, cycles, paths that leave the project root and chains too deep.
 */
final class SpecLoader {
  /** Precedent: include depth limits of 32-200 in compilers; specs nest far less. */
  static final int MAX_USE_DEPTH = 32;

  private final Workspace workspace;
  private final Map<Path, ParseResult> parsed;
  private final List<Diagnostic> diagnostics = new ArrayList<>();
  private final Map<Path, SpecFile> closure = new LinkedHashMap<>();
  private final Map<Path, List<UseEdge>> edges = new LinkedHashMap<>();
  private final Map<Path, String> dataFiles = new LinkedHashMap<>();
  private final Map<Path, String> dataFileProblems = new LinkedHashMap<>();

  /** Why the last file that {@link #parse} could not read was refused, in plain words, or null. */
  private String lastProblem;

  SpecLoader(Workspace workspace, Map<Path, ParseResult> parsed) {
    this.workspace = workspace;
    this.parsed = parsed;
  }

  /** Loads the root; returns false when the root itself cannot be read. */
  boolean load(Path root) {
    ParseResult result = parse(root);
    if (result == null) {
      return false;
    }
    Deque<Path> stack = new ArrayDeque<>();
    visit(root, result, stack);
    return true;
  }

  Map<Path, SpecFile> closure() {
    return closure;
  }

  Map<Path, List<UseEdge>> edges() {
    return edges;
  }

  List<Diagnostic> diagnostics() {
    return diagnostics;
  }

  /** Data files named by the specs (n,k tables) that exist inside the project, with their text. */
  Map<Path, String> dataFiles() {
    return dataFiles;
  }

  /**
   * Data files named by the specs that are there but cannot be read, with the reason in plain words
   * ("not valid UTF-8"), so the resolver does not call them missing.
   */
  Map<Path, String> dataFileProblems() {
    return dataFileProblems;
  }

  private void readDataFiles(Path file, SpecFile ast) {
    for (jonquil.syntax.Declaration d : ast.declarations()) {
      for (jonquil.syntax.Property p : d.properties()) {
        if (p.key().text().equals("table")
            && p.args().size() == 1
            && p.args().get(0) instanceof jonquil.syntax.Arg.StringArg s) {
          Path target;
          try {
            target = file.getParent().resolve(s.value()).normalize();
          } catch (java.nio.file.InvalidPathException e) {
            continue;
          }
          if (!target.startsWith(workspace.root()) || !workspace.reader().exists(target)) {
            continue; // the resolver reports it: it knows which table a material needs
          }
          if (!workspace.contains(target)) {
            dataFileProblems.put(target, "it leads out of the project through a link");
            continue;
          }
          try {
            dataFiles.put(target, workspace.reader().read(target, FileText.TABLE_LIMIT));
          } catch (IOException | RuntimeException e) {
            String problem = problem(e);
            if (problem != null) {
              dataFileProblems.put(target, problem);
            }
          }
        }
      }
    }
  }

  private void visit(Path file, ParseResult result, Deque<Path> stack) {
    closure.put(file, result.ast());
    readDataFiles(file, result.ast());
    stack.push(file);
    List<UseEdge> out = new ArrayList<>();
    Set<Path> seenHere = new HashSet<>();
    for (UseDecl use : result.ast().uses()) {
      Path target = target(file, use);
      if (target == null) {
        continue;
      }
      if (!seenHere.add(target)) {
        report(
            file,
            DiagnosticCode.DUPLICATE_USE,
            use,
            "'" + use.target() + "' is already used above; remove this line");
        continue;
      }
      if (stack.contains(target)) {
        report(
            file,
            DiagnosticCode.USE_CYCLE,
            use,
            "using '"
                + use.target()
                + "' makes a cycle: "
                + cycle(stack, target)
                + "; files cannot use each other in a circle");
        continue;
      }
      if (stack.size() >= MAX_USE_DEPTH) {
        report(
            file,
            DiagnosticCode.USE_TOO_DEEP,
            use,
            "files use each other more than "
                + MAX_USE_DEPTH
                + " levels deep; flatten the part libraries");
        continue;
      }
      if (!closure.containsKey(target)) {
        ParseResult child = parseUsed(file, use, target);
        if (child == null) {
          continue;
        }
        visit(target, child, stack);
      }
      out.add(new UseEdge(use, target));
    }
    edges.put(file, out);
    stack.pop();
  }

  private Path target(Path file, UseDecl use) {
    String written = use.target();
    if (written.isBlank()) {
      report(
          file,
          DiagnosticCode.USE_NOT_FOUND,
          use,
          "'use' needs a file path, e.g. 'use \"parts.jonq\"'");
      return null;
    }
    Path relative;
    try {
      relative = Path.of(written);
    } catch (java.nio.file.InvalidPathException e) {
      report(file, DiagnosticCode.USE_NOT_FOUND, use, "'" + written + "' is not a valid file path");
      return null;
    }
    if (relative.isAbsolute() || written.startsWith("/") || written.startsWith("\\")) {
      report(
          file,
          DiagnosticCode.USE_ESCAPES_ROOT,
          use,
          "'"
              + written
              + "' is an absolute path; write the path relative to this file so the spec works on"
              + " any machine");
      return null;
    }
    Path target = file.getParent().resolve(relative).normalize();
    if (!target.startsWith(workspace.root())) {
      report(file, DiagnosticCode.USE_ESCAPES_ROOT, use, outsideRoot(written, ""));
      return null;
    }
    if (!workspace.contains(target)) {
      // Say nothing of where the link leads: the target's name or text is none of this project's.
      report(file, DiagnosticCode.USE_ESCAPES_ROOT, use, outsideRoot(written, " through a link"));
      return null;
    }
    if (!workspace.reader().exists(target)) {
      String resolved = workspace.root().relativize(target).toString().replace('\\', '/');
      java.util.List<String> nearby =
          workspace.reader().specsIn(target.getParent()).stream()
              .map(p -> file.getParent().relativize(p).toString().replace('\\', '/'))
              .toList();
      report(
          file,
          DiagnosticCode.USE_NOT_FOUND,
          use,
          "file '"
              + written
              + "' not found"
              + (resolved.equals(written)
                  ? ""
                  : " (it would be '" + resolved + "' from the project root)")
              + jonquil.resolve.Suggest.hint(written, nearby));
      return null;
    }
    return target;
  }

  private ParseResult parseUsed(Path file, UseDecl use, Path target) {
    ParseResult child = parse(target);
    if (child == null) {
      report(
          file,
          DiagnosticCode.USE_UNREADABLE,
          use,
          "file '"
              + use.target()
              + "' cannot be read"
              + (lastProblem == null ? "" : ": " + lastProblem));
    }
    return child;
  }

  private ParseResult parse(Path file) {
    ParseResult cached = parsed.get(file);
    if (cached != null) {
      return cached;
    }
    lastProblem = null;
    String text;
    try {
      text = workspace.reader().read(file, FileText.SPEC_LIMIT);
    } catch (FileText.Refused e) {
      if (e.tooLarge()) {
        // The parser's J109, without reading what would be refused anyway.
        ParseResult tooLarge = tooLarge(file);
        parsed.put(file, tooLarge);
        return tooLarge;
      }
      lastProblem = e.getMessage();
      return null;
    } catch (IOException | RuntimeException e) {
      lastProblem = problem(e);
      return null;
    }
    ParseResult result = SpecParser.parse(new SourceFile(file, text), workspace.memo());
    parsed.put(file, result);
    return result;
  }

  private static ParseResult tooLarge(Path file) {
    return new ParseResult(
        new SourceFile(file, ""),
        SpecFile.empty(file),
        List.of(
            Diagnostic.of(
                DiagnosticCode.FILE_TOO_LARGE,
                file,
                TextRange.EMPTY,
                "file is larger than "
                    + FileText.SPEC_LIMIT / (1024 * 1024)
                    + " MiB; a spec this size is not supported")));
  }

  /** A read failure in plain words, or null when the file is simply not there. */
  private static String problem(Exception e) {
    if (e instanceof FileText.Refused) {
      return e.getMessage();
    }
    if (e instanceof java.nio.file.NoSuchFileException) {
      return null;
    }
    if (e instanceof java.nio.file.AccessDeniedException) {
      return "permission denied";
    }
    return "input/output error";
  }

  private String cycle(Deque<Path> stack, Path target) {
    List<String> names = new ArrayList<>();
    List<Path> order = new ArrayList<>(stack);
    java.util.Collections.reverse(order);
    boolean inCycle = false;
    for (Path p : order) {
      inCycle |= p.equals(target);
      if (inCycle) {
        names.add(p.getFileName().toString());
      }
    }
    names.add(target.getFileName().toString());
    return String.join(" → ", names);
  }

  private void report(Path file, DiagnosticCode code, UseDecl use, String message) {
    diagnostics.add(Diagnostic.of(code, file, use.targetRange(), message));
  }

  /**
   * Why a used path that leaves the project root is refused; {@code how} it leaves, if not plainly.
   */
  private String outsideRoot(String written, String how) {
    return "'"
        + written
        + "' leads outside the project root '"
        + workspace.root().getFileName()
        + "'"
        + how
        + "; keep used files inside the project";
  }
}
