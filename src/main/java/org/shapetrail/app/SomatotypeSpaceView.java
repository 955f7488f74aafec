package org.shapetrail.app;

import java.util.List;
import javafx.application.ConditionalFeature;
import javafx.application.Platform;
import javafx.geometry.Point3D;
import javafx.scene.Group;
import javafx.scene.Node;
import javafx.scene.PerspectiveCamera;
import javafx.scene.SceneAntialiasing;
import javafx.scene.SubScene;
import javafx.scene.control.Label;
import javafx.scene.layout.StackPane;
import javafx.scene.paint.Color;
import javafx.scene.paint.PhongMaterial;
import javafx.scene.shape.Cylinder;
import javafx.scene.shape.Sphere;
import javafx.scene.transform.Rotate;
import javafx.scene.transform.Translate;
import org.shapetrail.somatotype.Rating;

/**
 * A rotatable view of the somatotype space: the three component axes, each visit as a point, the path
 * in time order, and the chart plane (through 7-1-1, 1-7-1, 1-1-7) for orientation. Drag to rotate.
 * Where the graphics pipeline has no 3D (software rendering), a plain message is shown instead.
 */
public final class SomatotypeSpaceView extends StackPane {
    private static final double UNIT = 28;
    private final OrbitCamera orbit = new OrbitCamera();
    private final Rotate yaw = new Rotate(0, Rotate.Y_AXIS);
    private final Rotate pitch = new Rotate(0, Rotate.X_AXIS);
    private final Group world = new Group();
    private double lastX;
    private double lastY;

    public SomatotypeSpaceView() {
        setId("space-view");
        if (!Platform.isSupported(ConditionalFeature.SCENE3D)) {
            Label l = new Label(org.shapetrail.i18n.Messages.tr("space.noHardware"));
            l.setId("space-unavailable");
            l.setWrapText(true);
            getChildren().add(l);
            return;
        }
        world.getTransforms().addAll(pitch, yaw);
        Group root = new Group(world);
        SubScene sub = new SubScene(root, 400, 400, true, SceneAntialiasing.BALANCED);
        sub.setFill(Color.web("#faf7f0"));
        PerspectiveCamera cam = new PerspectiveCamera(true);
        cam.setNearClip(1);
        cam.setFarClip(5000);
        cam.getTransforms().add(new Translate(0, 0, -900));
        sub.setCamera(cam);
        sub.widthProperty().bind(widthProperty());
        sub.heightProperty().bind(heightProperty());
        getChildren().add(sub);
        sub.setOnMousePressed(e -> {
            lastX = e.getX();
            lastY = e.getY();
        });
        sub.setOnMouseDragged(e -> {
            orbit.drag(e.getX() - lastX, e.getY() - lastY);
            lastX = e.getX();
            lastY = e.getY();
            applyOrbit();
        });
        applyOrbit();
    }

    public OrbitCamera orbit() {
        return orbit;
    }

    private void applyOrbit() {
        yaw.setAngle(orbit.yaw());
        pitch.setAngle(orbit.pitch());
    }

    /** Shows the ratings (in time order) of one person. */
    public void show(List<Rating> ratings) {
        if (!Platform.isSupported(ConditionalFeature.SCENE3D)) {
            return;
        }
        world.getChildren().clear();
        // axes from the origin to 8 on each component: endomorphy x, mesomorphy y (up), ectomorphy z
        world.getChildren().add(axis(new Point3D(8, 0, 0), Color.web("#a3472f")));
        world.getChildren().add(axis(new Point3D(0, 8, 0), Color.web("#1f6f78")));
        world.getChildren().add(axis(new Point3D(0, 0, 8), Color.web("#3f5fa8")));
        world.getChildren().addAll(label(org.shapetrail.somatotype.Component.ENDOMORPHY.shown(), Rating.of(8.6, 0, 0)),
                label(org.shapetrail.somatotype.Component.MESOMORPHY.shown(), Rating.of(0, 8.6, 0)),
                label(org.shapetrail.somatotype.Component.ECTOMORPHY.shown(), Rating.of(0, 0, 8.6)));
        world.getChildren().addAll(plane());
        Point3D prev = null;
        for (int i = 0; i < ratings.size(); i++) {
            Rating r = ratings.get(i);
            Point3D p = pos(r);
            Sphere s = new Sphere(i == ratings.size() - 1 ? 9 : 6);
            s.setMaterial(new PhongMaterial(i == ratings.size() - 1 ? Color.web("#1d3b44") : Color.web("#1f6f78")));
            s.getTransforms().add(new Translate(p.getX(), p.getY(), p.getZ()));
            world.getChildren().add(s);
            if (prev != null) {
                world.getChildren().add(segment(prev, p, Color.web("#1f6f78"), 1.5));
            }
            prev = p;
        }
    }

    private static Node label(String text, Rating at) {
        javafx.scene.text.Text t = new javafx.scene.text.Text(text);
        t.setFill(Color.web("#1d3b44"));
        Point3D p = pos(at);
        t.getTransforms().add(new Translate(p.getX(), p.getY(), p.getZ()));
        return t;
    }

    private static Point3D pos(Rating r) {
        // centre the picture on 4-4-4; JavaFX y points down, so mesomorphy is negated
        return new Point3D((r.endomorphy() - 4) * UNIT, -(r.mesomorphy() - 4) * UNIT, (r.ectomorphy() - 4) * UNIT);
    }

    private static Node axis(Point3D to, Color c) {
        Point3D o = pos(Rating.of(0, 0, 0));
        Point3D end = pos(Rating.of(to.getX(), to.getY(), to.getZ()));
        return segment(o, end, c, 1.2);
    }

    private static Node segment(Point3D a, Point3D b, Color c, double radius) {
        Point3D d = b.subtract(a);
        Cylinder cyl = new Cylinder(radius, d.magnitude());
        cyl.setMaterial(new PhongMaterial(c));
        Point3D mid = a.midpoint(b);
        Point3D yAxis = new Point3D(0, 1, 0);
        Point3D axisOfRotation = d.crossProduct(yAxis);
        double angle = Math.toDegrees(Math.acos(d.normalize().dotProduct(yAxis)));
        cyl.getTransforms().addAll(new Translate(mid.getX(), mid.getY(), mid.getZ()),
                new Rotate(-angle, axisOfRotation.magnitude() < 1e-9 ? Rotate.X_AXIS : axisOfRotation));
        return cyl;
    }

    /** The chart plane for orientation: the triangle through 7-1-1, 1-7-1 and 1-1-7, drawn as its edges. */
    private static List<Node> plane() {
        Point3D a = pos(Rating.of(7, 1, 1));
        Point3D b = pos(Rating.of(1, 7, 1));
        Point3D c = pos(Rating.of(1, 1, 7));
        Color edge = Color.web("#8fb3b0");
        return List.of(segment(a, b, edge, 0.8), segment(b, c, edge, 0.8), segment(c, a, edge, 0.8));
    }

}
