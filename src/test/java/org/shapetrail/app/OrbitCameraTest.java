package org.shapetrail.app;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class OrbitCameraTest {
    @Test
    void aHorizontalDragTurnsTheYawByTheGainAndWraps() {
        OrbitCamera c = new OrbitCamera();
        double yaw = c.yaw();
        c.drag(100, 0);
        // 100 px × 0.4 °/px = 40° (derived); kept in [0, 360)
        assertEquals(((yaw + 40) % 360 + 360) % 360, c.yaw(), 1e-12);
    }

    @Test
    void pitchStopsShortOfTheVertical() {
        OrbitCamera c = new OrbitCamera();
        c.drag(0, -10_000);
        assertEquals(89, c.pitch(), 1e-12);
        c.drag(0, 10_000);
        assertEquals(-89, c.pitch(), 1e-12);
    }

    @Test
    void rotationKeepsLengthsAndTurnsTheXAxisAboutTheVertical() {
        OrbitCamera c = new OrbitCamera();
        c.drag(-c.yaw() / OrbitCamera.DEGREES_PER_PIXEL + 90 / OrbitCamera.DEGREES_PER_PIXEL, 0);
        c.drag(0, c.pitch() / OrbitCamera.DEGREES_PER_PIXEL);
        // yaw 90°, pitch 0: (1, 0, 0) → (0, 0, −1) (rotation about y, derived)
        double[] r = c.rotate(1, 0, 0);
        assertEquals(0, r[0], 1e-9);
        assertEquals(0, r[1], 1e-9);
        assertEquals(-1, r[2], 1e-9);
        double[] q = c.rotate(1, 2, 3);
        assertEquals(Math.sqrt(14), Math.sqrt(q[0] * q[0] + q[1] * q[1] + q[2] * q[2]), 1e-9);
    }
}
