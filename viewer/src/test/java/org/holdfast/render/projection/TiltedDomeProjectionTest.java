package org.holdfast.render.projection;

/** The projection contract for a wide, tilted dome. */
class TiltedDomeProjectionTest extends ProjectionContract {

    @Override
    Projection projection() {
        return new DomeProjection(400, 220, 35);
    }
}
