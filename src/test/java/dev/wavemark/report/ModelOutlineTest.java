package dev.wavemark.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.wavemark.core.geom.ImageAngles;
import dev.wavemark.core.geom.Point2;
import dev.wavemark.core.model.BodyShape;
import dev.wavemark.core.model.Side;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The model outline drawn over a frame follows the surfaces: upstream of a corner the wall runs
 * against the flow, downstream the surface is turned by the deflection towards the flow side
 * (geometry of the run file's model, not a measurement).
 */
class ModelOutlineTest {
  // a floor near the bottom of a 512-px frame, flow to the right, corners near the upstream edge
  private static final BodyShape.Wall FLOOR = new BodyShape.Wall(new Point2(1, 273), new Point2(511, 270), Side.LOWER);

  @Test
  void aDoubleRampsOutlineRunsUpstreamAlongTheWallAndUpItsSecondFace() {
    double d = Math.toRadians(8);
    BodyShape s = new BodyShape.DoubleRamp(d, new Point2(112, 272), d, new Point2(207, 258.6), FLOOR);
    List<Point2> line = ModelOutline.of(s, 0, 300).get(0);
    assertTrue(line.get(0).x() < 112, "the segment before the first corner lies upstream: " + line.get(0));
    Point2 last = line.get(line.size() - 1);
    double face = ImageAngles.direction(line.get(2), last);
    double wall = ImageAngles.direction(FLOOR.a(), FLOOR.b());
    assertEquals(16, Math.toDegrees(face - wall), 1e-9, "the second face is turned by both deflections");
  }

  @Test
  void aRampsOutlineTurnsAwayFromTheSolidSide() {
    BodyShape s = new BodyShape.Ramp(Math.toRadians(10), new Point2(100, 272), FLOOR);
    List<Point2> line = ModelOutline.of(s, 0, 200).get(0);
    assertTrue(line.get(0).x() < 100);
    double face = ImageAngles.direction(line.get(1), line.get(2));
    assertEquals(10, Math.toDegrees(face - ImageAngles.direction(FLOOR.a(), FLOOR.b())), 1e-9);
  }
}
