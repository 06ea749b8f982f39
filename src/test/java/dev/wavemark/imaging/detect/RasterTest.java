package dev.wavemark.imaging.detect;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Arrays;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * The fast per-frame helpers against their definitions: erosion by a (2r+1)-square with the
 * outside counted as non-flow, the median as the middle of the sorted values (mean of the two
 * middle ones for an even count), block averages, and the profile sampler against single samples.
 */
class RasterTest {
  private static Raster random(long seed, int w, int h) {
    Random rnd = new Random(seed);
    float[] d = new float[w * h];
    boolean[] f = new boolean[w * h];
    for (int i = 0; i < d.length; i++) {
      d[i] = (float) rnd.nextGaussian();
      f[i] = rnd.nextInt(25) != 0;
    }
    return new Raster(d, f, w, h, 1);
  }

  @Test
  void erosionMatchesTheSquareNeighbourhoodDefinition() {
    Raster r = random(3, 41, 29);
    for (int rad : new int[] {0, 1, 3}) {
      Raster e = r.eroded(rad);
      int count = 0;
      for (int y = 0; y < r.height; y++) {
        for (int x = 0; x < r.width; x++) {
          boolean all = true;
          for (int j = -rad; j <= rad; j++) {
            for (int i = -rad; i <= rad; i++) {
              int xx = x + i;
              int yy = y + j;
              all &= xx >= 0 && yy >= 0 && xx < r.width && yy < r.height && r.flow[yy * r.width + xx];
            }
          }
          assertEquals(all, e.flow[y * r.width + x], "pixel " + x + "," + y + " radius " + rad);
          count += all ? 1 : 0;
        }
      }
      assertEquals(count, e.flowCount());
    }
  }

  @Test
  void medianMatchesTheSortedMiddle() {
    Random rnd = new Random(5);
    for (int t = 0; t < 300; t++) {
      int n = 1 + rnd.nextInt(40);
      double[] v = new double[n];
      for (int i = 0; i < n; i++) {
        v[i] = rnd.nextInt(7) - 3 + (rnd.nextBoolean() ? 0.5 : 0);
      }
      double[] s = v.clone();
      Arrays.sort(s);
      double want = n % 2 == 1 ? s[n / 2] : 0.5 * (s[n / 2 - 1] + s[n / 2]);
      assertEquals(want, LineFit.medianInPlace(v.clone(), n), 0.0);
    }
    assertEquals(0, LineFit.medianInPlace(new double[0], 0), 0.0);
  }

  @Test
  void reducedIsTheBlockMeanAndAllFlow() {
    Raster r = random(7, 20, 13);
    Raster q = r.reduced(3);
    assertEquals(6, q.width);
    assertEquals(4, q.height);
    for (int y = 0; y < q.height; y++) {
      for (int x = 0; x < q.width; x++) {
        double s = 0;
        boolean all = true;
        for (int j = 0; j < 3; j++) {
          for (int i = 0; i < 3; i++) {
            s += r.data[(3 * y + j) * r.width + 3 * x + i];
            all &= r.flow[(3 * y + j) * r.width + 3 * x + i];
          }
        }
        assertEquals(s / 9, q.data[y * q.width + x], 1e-6);
        assertEquals(all, q.flow[y * q.width + x]);
      }
    }
  }

  @Test
  void profileSamplerGivesTheSingleSamples() {
    Raster r = random(11, 60, 50);
    for (int y = 0; y < r.height; y++) {
      Arrays.fill(r.flow, y * r.width, (y + 1) * r.width, true);
    }
    Random rnd = new Random(13);
    for (int t = 0; t < 200; t++) {
      double px = rnd.nextDouble() * 70 - 5;
      double py = rnd.nextDouble() * 60 - 5;
      double a = rnd.nextDouble() * 2 * Math.PI;
      int m = 33;
      double[] got = new double[m];
      boolean ok = r.sampleLine(px, py, Math.cos(a), Math.sin(a), 0.5, 8, m, got);
      double[] want = new double[m];
      boolean all = true;
      for (int j = 0; j < m && all; j++) {
        double o = j * 0.5 - 8;
        want[j] = r.sample(px + o * Math.cos(a), py + o * Math.sin(a));
        all = !Double.isNaN(want[j]);
      }
      assertEquals(all, ok);
      if (ok) {
        assertArrayEquals(want, got, 0.0);
      }
    }
  }
}
