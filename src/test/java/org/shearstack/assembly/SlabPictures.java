package org.shearstack.assembly;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.Path2D;
import java.awt.image.BufferedImage;
import java.io.File;
import java.util.List;

import javax.imageio.ImageIO;

import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.Polygon;
import org.shearstack.geom.Slab;
import org.shearstack.rules.geometry.TestDesigns;

/** Looks at parts: draws every slab of some demo parts (top views, one panel per slab) into target/slabs/*.png. */
public final class SlabPictures {

    public static void main(String[] args) throws Exception {
        Kit kit = Kit.build("demo", TestDesigns.demo(), KitTest.CTX);
        new File("target/slabs").mkdirs();
        for (KitPart p : kit.printedParts()) {
            List<Slab> slabs = p.solid().slabs();
            int n = slabs.size();
            int cell = 300;
            BufferedImage img = new BufferedImage(cell * Math.min(n, 4), cell * ((n + 3) / 4), BufferedImage.TYPE_INT_RGB);
            Graphics2D g = img.createGraphics();
            g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
            g.setColor(Color.WHITE);
            g.fillRect(0, 0, img.getWidth(), img.getHeight());
            var fp = Kit.footprint(p.solid(), KitTest.CTX);
            double size = Math.max(fp.widthMm(), fp.heightMm());
            for (int i = 0; i < n; i++) {
                int ox = (i % 4) * cell;
                int oy = (i / 4) * cell;
                double s = (cell - 20) / size;
                Path2D path = new Path2D.Double(Path2D.WIND_EVEN_ODD);
                Geometry geom = slabs.get(i).region().geometry();
                for (int k = 0; k < geom.getNumGeometries(); k++) {
                    Polygon poly = (Polygon) geom.getGeometryN(k);
                    add(path, poly.getExteriorRing().getCoordinates(), ox, oy, s, fp, cell);
                    for (int h = 0; h < poly.getNumInteriorRing(); h++) {
                        add(path, poly.getInteriorRingN(h).getCoordinates(), ox, oy, s, fp, cell);
                    }
                }
                g.setColor(new Color(120, 160, 220));
                g.fill(path);
                g.setColor(Color.DARK_GRAY);
                g.setStroke(new BasicStroke(1f));
                g.draw(path);
                g.drawString(String.format(java.util.Locale.ROOT, "z %.2f-%.2f", slabs.get(i).z0Mm(), slabs.get(i).z1Mm()),
                        ox + 5, oy + 15);
            }
            ImageIO.write(img, "png", new File("target/slabs/" + p.name() + ".png"));
        }
    }

    private static void add(Path2D path, Coordinate[] cs, int ox, int oy, double s, org.shearstack.geom.Bounds2 fp,
            int cell) {
        for (int i = 0; i < cs.length; i++) {
            double x = ox + 10 + (cs[i].x - fp.minXMm()) * s;
            double y = oy + cell - 10 - (cs[i].y - fp.minYMm()) * s;
            if (i == 0) {
                path.moveTo(x, y);
            } else {
                path.lineTo(x, y);
            }
        }
        path.closePath();
    }
}
