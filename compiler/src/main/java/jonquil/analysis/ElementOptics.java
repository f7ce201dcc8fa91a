package jonquil.analysis;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import jonquil.optics.Coherency;
import jonquil.optics.Fresnel;
import jonquil.optics.Jones;
import jonquil.optics.beam.Clipping;
import jonquil.resolve.Param;
import jonquil.resolve.ResolvedElement;
import jonquil.resolve.SplitterFractions;
import jonquil.resolve.Symbol;
import jonquil.resolve.Value;
import jonquil.source.InOrder;
import org.apache.commons.math3.complex.Complex;

/**
 * The optical model of each element kind: how one incoming beam divides among the element's ports,
 * its ghosts and absorption. Defaults for unstated values are listed in compiler/README.md
 * ("Element models").
 */
final class ElementOptics {
  /**
   * Extinction ratio of a polarizer when none is stated: ideal, so the crossed state passes nothing
   * (a large finite ratio still leaks at first order in the field between tilted polarizers).
   */
  static final double IDEAL_EXTINCTION = Double.POSITIVE_INFINITY;

  private final MaterialModel materials;
  private final SurfaceModel surfaces;

  ElementOptics(MaterialModel materials, SurfaceModel surfaces) {
    this.materials = materials;
    this.surfaces = surfaces;
  }

  Response respond(ResolvedElement e, TracedBeam in) {
    double plane = e.number(Param.PLANE, "angle").orElse(0);
    return switch (e.kind()) {
      case POLARIZER -> {
        double axis = e.number(Param.AXIS, "angle").orElse(0);
        double t = e.number(Param.TRANSMISSION, "t").orElse(1);
        double er = e.number(Param.EXTINCTION, "ratio").orElse(IDEAL_EXTINCTION);
        yield through(in, "out", Jones.polarizer(axis, t, er));
      }
      case WAVEPLATE -> coatedPlate(e, in, waveplate(e, in.wavelength()));
      case ROTATOR -> {
        double t = e.number(Param.TRANSMISSION, "t").orElse(1);
        yield through(
            in,
            "out",
            Jones.rotator(e.number(Param.ROTATION, "angle").orElse(0)).scaled(Math.sqrt(t)));
      }
      case DEPOLARIZER -> {
        double f = e.number(Param.DEPOLARIZATION, "d").orElse(1);
        double t = e.number(Param.TRANSMISSION, "t").orElse(1);
        yield Response.balance(
            in,
            Map.of("out", in.with(in.light().depolarized(f).scaled(t))),
            List.of()); // no Jones matrix
      }
      case SPLITTER -> splitter(e, in, plane);
      case MIRROR -> mirror(e, in, plane);
      case WINDOW, PLATE -> window(e, in, plane);
      case INTERFACE -> interfaceSurface(e, in, plane);
      case LENS -> lens(e, in);
      case FILTER -> {
        OptionalDouble od = e.number(Param.OD, "od");
        double t =
            od.isPresent()
                ? Math.pow(10, -od.getAsDouble())
                : e.number(Param.TRANSMISSION, "t").orElse(1);
        if (outsideBand(e, in.wavelength())) {
          t = Math.pow(10, -e.number(Param.BLOCKING, "od").orElse(0));
        }
        yield Response.balance(in, Map.of("out", in.with(in.light().scaled(t))), List.of())
            .withJones(scalar("out", t));
      }
      case RHOMB -> rhomb(e, in);
      case ISOLATOR -> through(in, "out", isolator(e, false));
      case APERTURE -> aperture(e, in);
      case PROBE -> Response.balance(in, Map.of("out", in), List.of()).withJones(scalar("out", 1));
      case DETECTOR, DUMP -> Response.absorbedAll(in);
      // The train resolver keeps these out of beam paths (J507, J509), and a spec with errors
      // is not analysed, so light never reaches them here.
      case SOURCE, MATERIAL, COATING ->
          throw new IllegalArgumentException(
              e.kind().word() + " '" + e.symbol().name() + "' cannot stand in a beam path");
    };
  }

  /**
   * One beam entering an element by {@code face} ({@link
   * jonquil.resolve.ElementKind#entryFaces()}); the ports of the response are the exits its light
   * leaves by.
   *
   * <p>A back-face pass uses reciprocity. Its frame is the mirror image of the first pass's: with
   * (x, y, k) the frame of the light that left by {@code out} or {@code through}, the returning
   * light is described in (−x, y, −k), which is where a mirror at normal incidence leaves it. In
   * that frame a reciprocal element's reverse matrix is M·Jᵀ·M with M = diag(−1, 1); every Jones
   * matrix here but a rotator's is symmetric (Jᵀ = J), so the reverse pass is the forward physics
   * seen in a mirror: flip x, act, flip back. A Faraday rotator is not reciprocal: its rotation
   * keeps its sense against the magnet, not the beam, so its reverse matrix is M·J·M, which turns
   * by −ρ in the returning frame, and a double pass turns by 2ρ; an optically active (reciprocal)
   * rotator undoes itself. Light entering by {@code reflected} or {@code side} meets the forward
   * physics in its own carried frame (exact for planes of incidence at 0° or 90°).
   */
  Response respondFrom(ResolvedElement e, TracedBeam in, String face, FaceFrames frames) {
    if (face.equals("front")) {
      return respond(e, in);
    }
    if (!face.equals("back")) {
      Response r = respond(e, in);
      Map<String, TracedBeam> ports = new java.util.LinkedHashMap<>();
      Map<String, Jones> jones = new java.util.LinkedHashMap<>();
      r.ports().forEach((port, b) -> ports.put(e.kind().exitFor(face, port), b));
      r.jones().forEach((port, j) -> jones.put(e.kind().exitFor(face, port), j));
      return new Response(ports, r.absorbed(), r.ghosts(), r.clipped(), jones, r.surface());
    }
    BeamFrame back = frames.out().mirrored();
    Coherency light = in.light();
    if (in.frame().k().dot(back.k()) > 0.999) {
      light =
          light.inFrameRotatedBy(
              Math.atan2(back.x().dot(in.frame().y()), back.x().dot(in.frame().x())));
    }
    TracedBeam asForward = in.with(mirrored(light), frames.in());
    Response r;
    if (e.kind() == jonquil.resolve.ElementKind.ISOLATOR) {
      r = through(asForward, "out", isolator(e, true));
    } else if (e.kind() == jonquil.resolve.ElementKind.ROTATOR
        && !e.word(Param.TYPE, "type").orElse("reciprocal").equals("faraday")) {
      double t = e.number(Param.TRANSMISSION, "t").orElse(1);
      r =
          through(
              asForward,
              "out",
              Jones.rotator(-e.number(Param.ROTATION, "angle").orElse(0)).scaled(Math.sqrt(t)));
    } else {
      r = respond(e, asForward);
    }
    Map<String, TracedBeam> ports = new java.util.LinkedHashMap<>();
    Map<String, Jones> jones = new java.util.LinkedHashMap<>();
    BeamFrame front = frames.in().mirrored();
    r.ports()
        .forEach(
            (port, b) -> {
              String exit = e.kind().exitFor(face, port);
              BeamFrame f = exit.equals("front") ? front : b.frame().mirrored();
              ports.put(exit, b.with(mirrored(b.light()), f));
            });
    r.jones().forEach((port, j) -> jones.put(e.kind().exitFor(face, port), mirrored(j)));
    List<Ghost> ghosts =
        r.ghosts().stream()
            .map(
                g ->
                    new Ghost(
                        g.label(),
                        g.beam().with(mirrored(g.beam().light()), g.beam().frame().mirrored()),
                        !g.backward()))
            .toList();
    return new Response(ports, r.absorbed(), ghosts, r.clipped(), jones, r.surface());
  }

  /**
   * An isolator's matrix, in the first pass's frame. Polarization-independent: √(1/loss) forward,
   * √(1/isolation) backward, whatever the state. Polarization-dependent: a polarizer at the axis, a
   * 45° Faraday rotator and a polarizer at axis + 45°, each polarizer with the isolation as its
   * extinction and the loss shared between them; backward the light meets them in reverse order and
   * the rotator turns it the same way again (M·J·M for the rotator alone), so it reaches the entry
   * polarizer crossed.
   */
  private static Jones isolator(ResolvedElement e, boolean backward) {
    double loss = e.number(Param.INSERTION_LOSS, "loss").orElse(1);
    double isolation = e.number(Param.ISOLATION, "ratio").orElse(1);
    if (!e.word(Param.TYPE, "type").orElse("independent").equals("dependent")) {
      return Jones.IDENTITY.scaled(Math.sqrt(1 / (backward ? isolation : loss)));
    }
    double axis = e.number(Param.AXIS, "angle").orElse(0);
    double each = Math.sqrt(1 / loss);
    Jones entry = Jones.polarizer(axis, each, isolation);
    Jones exit = Jones.polarizer(axis + Math.PI / 4, each, isolation);
    Jones faraday = Jones.rotator(Math.PI / 4);
    return backward ? entry.times(faraday).times(exit) : exit.times(faraday).times(entry);
  }

  /**
   * The frames of an element's first pass: the light arriving, and the light leaving by its first
   * port.
   */
  record FaceFrames(BeamFrame in, BeamFrame out) {}

  /**
   * The fraction {@code r} of a beam that a face sends straight back, as a mirror at normal
   * incidence leaves it: in the mirrored frame with its x axis reversed (the frame a return pass
   * reads, {@link #respondFrom}), so a ghost passes back through a polarizer as it came.
   */
  private static TracedBeam straightBack(TracedBeam in, double r) {
    return in.with(mirrored(in.light()).scaled(r), in.frame().mirrored());
  }

  /** Light described with its x axis reversed: M·Φ·M with M = diag(−1, 1). */
  private static Coherency mirrored(Coherency c) {
    return Coherency.of(c.xx(), c.yy(), -c.xyRe(), -c.xyIm());
  }

  /** M·J·M with M = diag(−1, 1): a matrix read in frames whose x axes are reversed. */
  private static Jones mirrored(Jones j) {
    return Jones.of(j.a(), j.b().negate(), j.c().negate(), j.d());
  }

  /** Whether a filter's stated band leaves this wavelength out (the band's ends are inside). */
  private static boolean outsideBand(ResolvedElement e, double wavelength) {
    Optional<Value.Group> band =
        e.param(Param.BAND)
            .flatMap(b -> b.slot("from..to"))
            .filter(v -> v instanceof Value.Group)
            .map(v -> (Value.Group) v);
    if (band.isEmpty()) {
      return false;
    }
    double from = band.get().number("low").orElse(0);
    double to = band.get().number("high").orElse(Double.POSITIVE_INFINITY);
    return wavelength < from || wavelength > to;
  }

  private static Response aperture(ResolvedElement e, TracedBeam in) {
    double d = e.number(Param.DIAMETER, "diameter").orElse(Double.POSITIVE_INFINITY);
    if (in.mode().isEmpty()) {
      return Response.balance(in, Map.of("out", in), List.of())
          .withJones(scalar("out", 1)); // no beam size
    }
    double f = Clipping.transmittedFraction(in.mode().get().radius(), d);
    return Response.balance(in, Map.of("out", in.with(in.light().scaled(f))), List.of())
        .clipping(1 - f)
        .withJones(scalar("out", f));
  }

  private static Response through(TracedBeam in, String port, Jones j) {
    return Response.balance(in, Map.of(port, in.with(in.light().transform(j))), List.of())
        .withJones(Map.of(port, j));
  }

  /**
   * √T times the identity: an element that only scales the power by T, whatever the polarization.
   */
  private static Map<String, Jones> scalar(String port, double powerFactor) {
    return Map.of(port, Jones.rotation(0).scaled(Math.sqrt(Math.max(0, powerFactor))));
  }

  /**
   * Retardance at the beam's wavelength: from the birefringence when the material is known, else
   * scaled as 1/λ.
   */
  Jones waveplate(ResolvedElement e, double wavelength) {
    Value.Group r = e.param(Param.RETARDANCE).orElseThrow();
    double design = r.number("retardance").orElse(0);
    OptionalDouble designWavelength = r.number("wavelength");
    double waves = design / (2 * Math.PI);
    Optional<String> order = e.word(Param.ORDER, "order");
    if (order.isPresent() && order.get().equals("multi")) {
      waves += e.number(Param.ORDER, "m").orElse(0);
    }
    double retardance = design;
    Optional<Symbol> material = e.ref(Param.MATERIAL, "material");
    OptionalDouble thickness = e.number(Param.THICKNESS, "thickness");
    if (material.isPresent()) {
      OptionalDouble dn = materials.birefringence(material.get(), wavelength);
      if (dn.isPresent() && dn.getAsDouble() != 0) {
        double d;
        if (thickness.isPresent()) {
          d = thickness.getAsDouble();
        } else {
          double l0 = designWavelength.orElse(wavelength);
          d =
              waves
                  * l0
                  / Math.abs(materials.birefringence(material.get(), l0).orElse(dn.getAsDouble()));
        }
        retardance = 2 * Math.PI * Math.abs(dn.getAsDouble()) * d / wavelength;
        return Jones.retarder(retardance, e.number(Param.FAST_AXIS, "angle").orElse(0));
      }
    }
    if (designWavelength.isPresent()) {
      retardance = 2 * Math.PI * waves * designWavelength.getAsDouble() / wavelength;
    }
    return Jones.retarder(retardance, e.number(Param.FAST_AXIS, "angle").orElse(0));
  }

  /**
   * A plate acting by its Jones matrix, whose two coated faces (when a coating is given) reflect
   * part of the light back as a ghost, summed incoherently like a window's.
   */
  private Response coatedPlate(ResolvedElement e, TracedBeam in, Jones j) {
    if (e.param(Param.COATING).isEmpty()) {
      return through(in, "out", j);
    }
    Complex outside = materials.index(in.medium(), in.wavelength());
    Complex inside =
        e.ref(Param.MATERIAL, "material")
            .map(m -> real(materials.index(m, in.wavelength())))
            .orElse(new Complex(1.5, 0));
    SurfaceModel.Powers face = surfaces.surface(e, real(outside), inside, 0, in.wavelength());
    return betweenFaces(in, j, face);
  }

  private Response splitter(ResolvedElement e, TracedBeam in, double plane) {
    double aoi = e.number(Param.AOI, "angle").orElse(Math.PI / 4);
    SplitterFractions f =
        SplitterFractions.of(
            e.has(Param.POLARIZING),
            e.number(Param.RATIO, "reflected"),
            e.number(Param.TRANSMIT_P, "t"),
            e.number(Param.TRANSMIT_S, "t"),
            e.number(Param.REFLECT_P, "r"),
            e.number(Param.REFLECT_S, "r"),
            e.number(Param.EXTINCTION, "ratio"));
    // A dichroic's split holds inside its band; outside it, what it reflected it transmits.
    boolean swapped = outsideBand(e, in.wavelength());
    double tp = swapped ? f.rp() : f.tp();
    double ts = swapped ? f.rs() : f.ts();
    double rs = swapped ? f.ts() : f.rs();
    double rp = swapped ? f.tp() : f.rp();
    Jones pass = Jones.transmission(Complex.ONE, Complex.ONE, plane, clamp(tp), clamp(ts));
    Coherency through = in.light().transform(pass);
    Jones reflect =
        Jones.reflection(
            new Complex(Math.sqrt(clamp(rp)), 0), new Complex(-Math.sqrt(clamp(rs)), 0), plane);
    TracedBeam reflected = in.with(in.light().transform(reflect), in.frame().reflect(aoi, plane));
    if (e.param(Param.COATING).isEmpty()) {
      return Response.balance(
              in, InOrder.of("through", in.with(through), "reflected", reflected), List.of())
          .withJones(InOrder.of("through", pass, "reflected", reflect));
    }
    // A coating is on the cube's outer faces (glass of n = 1.5 assumed, as for a coated plate),
    // met at normal incidence: once on entry (its reflection heads back) and once at each exit
    // (those reflections are stray inside the cube); single passes, summed incoherently.
    Complex outside = real(materials.index(in.medium(), in.wavelength()));
    SurfaceModel.Powers face =
        surfaces.surface(e, outside, new Complex(1.5, 0), 0, in.wavelength());
    double t = face.ts();
    double exitLoss = t * face.rs() * (through.power() + reflected.power());
    return Response.balance(
            in,
            InOrder.of(
                "through",
                in.with(through.scaled(t * t)),
                "reflected",
                reflected.with(reflected.light().scaled(t * t))),
            List.of(
                new Ghost("entry face reflection", straightBack(in, face.rs()), true),
                new Ghost(
                    "exit face reflections",
                    in.with(in.light().scaled(exitLoss / Math.max(in.power(), Double.MIN_VALUE))),
                    false)))
        .withJones(InOrder.of("through", pass.scaled(t), "reflected", reflect.scaled(t)));
  }

  private Response mirror(ResolvedElement e, TracedBeam in, double plane) {
    double aoi = e.number(Param.AOI, "angle").orElse(0);
    Jones j;
    OptionalDouble r = e.number(Param.REFLECTANCE, "r");
    Optional<Value.Group> coating = e.param(Param.COATING);
    if (r.isEmpty() && coating.isPresent() && coating.get().word("type").isPresent()) {
      r = coating.get().number("reflectance");
    }
    Complex outside = materials.index(in.medium(), in.wavelength());
    if (r.isPresent()) {
      double amp = Math.sqrt(r.getAsDouble());
      j = Jones.reflection(new Complex(amp, 0), new Complex(-amp, 0), plane);
    } else {
      Complex substrate =
          e.ref(Param.METAL, "metal")
              .map(m -> materials.index(m, in.wavelength()))
              .orElse(new Complex(1.5, 0));
      Fresnel.Coefficients c;
      if (coating.isPresent()
          && coating.get().slot("stack").orElse(null) instanceof Value.Ref stack) {
        c =
            jonquil.optics.ThinFilm.stack(
                outside,
                surfaces.layers(stack.symbol(), in.wavelength()),
                substrate,
                aoi,
                in.wavelength());
      } else {
        c = Fresnel.at(outside, substrate, aoi);
      }
      j = Jones.reflection(c.rp(), c.rs(), plane);
    }
    return Response.balance(
            in,
            Map.of("out", in.with(in.light().transform(j), in.frame().reflect(aoi, plane))),
            List.of())
        .withJones(Map.of("out", j));
  }

  /**
   * A plate: two surfaces and the bulk, with the multiple reflections between them summed
   * incoherently (the usual model for a plate much thicker than the coherence length).
   */
  private Response window(ResolvedElement e, TracedBeam in, double plane) {
    double aoi = e.number(Param.AOI, "angle").orElse(0);
    double wl = in.wavelength();
    Symbol glass = e.ref(Param.MATERIAL, "material").orElseThrow();
    Medium after = e.ref(Param.THEN, "medium").map(Medium::of).orElse(in.medium());
    // Surfaces use the real indices; the glass's (weak) absorption acts in the bulk through τ.
    Complex n1 = real(materials.index(in.medium(), wl));
    Complex ng = real(materials.index(glass, wl));
    Complex n3 = real(materials.index(after, wl));
    SurfaceModel.Powers front = surfaces.surface(e, n1, ng, aoi, wl);
    double sinInside = n1.getReal() * Math.sin(aoi) / ng.getReal();
    double inside = Math.asin(Math.max(-1, Math.min(1, sinInside)));
    SurfaceModel.Powers back = surfaces.surface(e, ng, n3, inside, wl);
    double thickness = e.number(Param.THICKNESS, "thickness").orElse(0);
    double tau =
        Math.exp(-materials.absorption(Medium.of(glass), wl) * thickness / Math.cos(inside));
    double[] tS = plate(front.rs(), front.ts(), back.rs(), back.ts(), tau);
    double[] tP = plate(front.rp(), front.tp(), back.rp(), back.tp(), tau);
    Jones pass = Jones.transmission(Complex.ONE, Complex.ONE, plane, tP[0], tS[0]);
    Coherency through = in.light().transform(pass);
    Jones reflect =
        Jones.reflection(
            new Complex(Math.sqrt(tP[1]), 0), new Complex(-Math.sqrt(tS[1]), 0), plane);
    TracedBeam reflected = in.with(in.light().transform(reflect), in.frame().reflect(aoi, plane));
    // The mode crosses the plate as two flat interfaces with the glass between (tilt neglected).
    TracedBeam out =
        in.with(through)
            .in(after)
            .withMode(
                in.mode()
                    .map(
                        g ->
                            g.intoMedium(ng.getReal())
                                .propagate(thickness)
                                .intoMedium(n3.getReal())));
    return Response.balance(in, InOrder.of("through", out, "reflected", reflected), List.of())
        .withJones(InOrder.of("through", pass, "reflected", reflect));
  }

  /**
   * Through two like faces with {@code j} between them; what the faces reflect heads back as a
   * ghost.
   */
  private static Response betweenFaces(TracedBeam in, Jones j, SurfaceModel.Powers face) {
    double[] pair = plate(face.rs(), face.ts(), face.rs(), face.ts(), 1);
    TracedBeam out = in.with(in.light().transform(j).scaled(pair[0]));
    TracedBeam back = straightBack(in, pair[1]);
    return Response.balance(
            in, Map.of("out", out), List.of(new Ghost("face reflections", back, true)))
        .withJones(Map.of("out", j.scaled(Math.sqrt(pair[0]))));
  }

  /**
   * Incoherent plate: {transmittance, reflectance} from the two surfaces and the internal
   * transmittance τ.
   */
  static double[] plate(double r1, double t1, double r2, double t2, double tau) {
    double denominator = 1 - r1 * r2 * tau * tau;
    if (!(denominator > 0)) {
      // Both faces reflect all (grazing incidence, rounded to R = 1): nothing gets through.
      return new double[] {0, r1};
    }
    double t = t1 * t2 * tau / denominator;
    double r = r1 + t1 * t1 * r2 * tau * tau / denominator;
    return new double[] {t, r};
  }

  private Response interfaceSurface(ResolvedElement e, TracedBeam in, double plane) {
    double aoi = e.number(Param.AOI, "angle").orElse(0);
    double wl = in.wavelength();
    Symbol from = e.ref(Param.FROM, "material").orElseThrow();
    Symbol to = e.ref(Param.TO, "material").orElseThrow();
    // The incidence medium's loss acts in its bulk, not at the face: Fresnel's power split holds
    // for a lossless incidence medium only, and with κ > 0 it sent out more than came in.
    Complex n1 = real(materials.index(from, wl));
    Complex n2 = materials.index(to, wl);
    Fresnel.Coefficients c = Fresnel.at(n1, n2, aoi);
    SurfaceModel.Powers powers = surfaces.surface(e, n1, n2, aoi, wl);
    Jones pass = Jones.transmission(Complex.ONE, Complex.ONE, plane, powers.tp(), powers.ts());
    Coherency through = in.light().transform(pass);
    Jones reflect =
        e.param(Param.COATING).isPresent()
            ? Jones.reflection(
                new Complex(Math.sqrt(powers.rp()), 0),
                new Complex(-Math.sqrt(powers.rs()), 0),
                plane)
            : Jones.reflection(c.rp(), c.rs(), plane);
    TracedBeam reflected = in.with(in.light().transform(reflect), in.frame().reflect(aoi, plane));
    TracedBeam out =
        in.with(through).in(Medium.of(to)).withMode(in.mode().map(g -> g.intoMedium(n2.getReal())));
    return Response.balance(in, InOrder.of("through", out, "reflected", reflected), List.of())
        .withJones(InOrder.of("through", pass, "reflected", reflect))
        .withSurface(
            new SurfaceAtAngle(
                wl,
                aoi,
                n1,
                n2,
                e.param(Param.COATING).isPresent(),
                powers.rs(),
                powers.rp(),
                powers.ts(),
                powers.tp()));
  }

  /** A thin lens: two surfaces at normal incidence; their reflections head back as ghosts. */
  private Response lens(ResolvedElement e, TracedBeam in) {
    double focal = e.number(Param.FOCAL, "focal").orElse(Double.POSITIVE_INFINITY);
    double clip = 1;
    OptionalDouble clear = e.number(Param.CLEAR_APERTURE, "diameter");
    if (clear.isPresent() && in.mode().isPresent()) {
      clip = Clipping.transmittedFraction(in.mode().get().radius(), clear.getAsDouble());
    }
    TracedBeam focused =
        in.withMode(in.mode().map(g -> g.throughThinLens(focal))).with(in.light().scaled(clip));
    Response r = lensSurfaces(e, focused);
    Map<String, TracedBeam> ports = r.ports();
    double kept =
        in.power() > 0 && ports.containsKey("out") ? ports.get("out").power() / in.power() : 1;
    return Response.balance(in, ports, r.ghosts())
        .clipping(1 - clip)
        .withJones(scalar("out", kept));
  }

  private Response lensSurfaces(ResolvedElement e, TracedBeam in) {
    Optional<Symbol> glass = e.ref(Param.MATERIAL, "material");
    if (glass.isEmpty() && e.param(Param.COATING).isEmpty()) {
      return Response.balance(
          in, Map.of("out", in), List.of()); // an ideal lens: nothing known about its surfaces
    }
    double wl = in.wavelength();
    Complex outside = real(materials.index(in.medium(), wl));
    Complex n = glass.map(g -> real(materials.index(g, wl))).orElse(new Complex(1.5, 0));
    SurfaceModel.Powers s1 = surfaces.surface(e, outside, n, 0, wl);
    // The glass absorbs over the centre thickness (its edge is thinner or thicker; a thin lens).
    double tau =
        glass
            .map(
                g ->
                    Math.exp(
                        -materials.absorption(Medium.of(g), wl)
                            * e.number(Param.THICKNESS, "thickness").orElse(0)))
            .orElse(1.0);
    double[] pair = plate(s1.rs(), s1.ts(), s1.rs(), s1.ts(), tau);
    TracedBeam out = in.with(in.light().scaled(pair[0]));
    TracedBeam back = straightBack(in, pair[1]);
    return Response.balance(
        in, Map.of("out", out), List.of(new Ghost("surface reflections", back, true)));
  }

  /**
   * A total-internal-reflection retarder: each reflection adds the TIR phase difference between p
   * and s; with an even number of reflections the beam leaves parallel to its entry, in the same
   * frame. The uncoated faces lose their Fresnel reflections as ghosts.
   */
  private Response rhomb(ResolvedElement e, TracedBeam in) {
    double wl = in.wavelength();
    Symbol glass = e.ref(Param.MATERIAL, "material").orElseThrow();
    Complex n = real(materials.index(glass, wl));
    Complex outside = real(materials.index(in.medium(), wl));
    double aoi = e.number(Param.AOI, "angle").orElse(0);
    int reflections = (int) e.number(Param.REFLECTIONS, "n").orElse(2);
    if (!(n.getReal() * Math.sin(aoi) > outside.getReal())) {
      // No total internal reflection (the medium around it is as dense, or the angle is below the
      // critical one): the faces would pass most of the light out sideways, which this model of a
      // retarder does not follow, so the element is refused rather than guessed.
      throw new UnphysicalModel(
          jonquil.diag.DiagnosticCode.OUT_OF_RANGE,
          e.symbol().file(),
          e.symbol().declaration().map(d -> d.range()).orElse(jonquil.source.TextRange.EMPTY),
          String.format(
              java.util.Locale.ROOT,
              "rhomb '%s' retards by total internal reflection, which needs n sin(aoi) above the"
                  + " index around it: here %.4f x sin %.1f deg = %.4f, around it %.4f; use a"
                  + " denser glass or a larger 'aoi', or place it in air",
              e.symbol().name(),
              n.getReal(),
              Math.toDegrees(aoi),
              n.getReal() * Math.sin(aoi),
              outside.getReal()));
    }
    Fresnel.Coefficients tir = Fresnel.at(n, outside, aoi);
    Complex rp = tir.rp().pow(reflections);
    Complex rs = tir.rs().pow(reflections);
    if (reflections % 2 == 1) {
      rs = rs.negate(); // an odd count leaves the frame mirrored; undo the s flip to keep the
      // entry frame
    }
    Jones j = Jones.reflection(rp, rs, e.number(Param.AXIS, "angle").orElse(0));
    SurfaceModel.Powers face = SurfaceModel.Powers.of(Fresnel.at(outside, n, 0));
    return betweenFaces(in, j, face);
  }

  /** The real part alone: interfaces of weakly absorbing glass are treated as lossless. */
  private static Complex real(Complex n) {
    return new Complex(n.getReal(), 0);
  }

  private static double clamp(double v) {
    return Math.max(0, Math.min(1, v));
  }
}
