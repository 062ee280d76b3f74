"use client";
/**
 * An HTML text label pinned to its parent object in the scene. A plain DOM element over the
 * canvas (no extra React root, no font download), moved every frame by projecting the parent's
 * world position to the screen; hidden behind the camera. Plays the role of drei's <Html> for
 * short labels without its per-label React root (whose synchronous unmount warns under React 19).
 */
import { useEffect, useMemo, useRef } from "react";
import { useFrame, useThree } from "@react-three/fiber";
import { Vector3, type Group } from "three";

export interface SceneLabelProps {
  text: string;
  /** Classes of the label element (Tailwind). */
  className?: string;
  /** Screen offset from the anchor, px (x right, y down); the label is centred on x. */
  offsetPx?: [number, number];
  /** Draw above other labels. */
  front?: boolean;
}

export function SceneLabel({ text, className = "", offsetPx = [0, 12], front = false }: SceneLabelProps) {
  const gl = useThree((s) => s.gl);
  const anchor = useRef<Group>(null);
  const el = useMemo(() => (typeof document === "undefined" ? null : document.createElement("span")), []);
  const v = useRef(new Vector3());

  useEffect(() => {
    const host = gl.domElement.parentElement;
    if (!el || !host) return;
    el.style.cssText = "position:absolute;left:0;top:0;pointer-events:none;white-space:nowrap;will-change:transform;";
    el.style.zIndex = front ? "3" : "2";
    host.appendChild(el);
    return () => {
      el.remove();
    };
  }, [gl, el, front]);

  useEffect(() => {
    if (!el) return;
    el.textContent = text;
    el.className = "select-none text-[11px] leading-none " + className;
  }, [el, text, className]);

  useFrame(({ camera, size }) => {
    const a = anchor.current;
    if (!el || !a) return;
    a.getWorldPosition(v.current);
    v.current.project(camera);
    const visible = v.current.z < 1 && Math.abs(v.current.x) < 1.2 && Math.abs(v.current.y) < 1.2;
    if (!visible) {
      el.style.display = "none";
      return;
    }
    el.style.display = "";
    const x = ((v.current.x + 1) / 2) * size.width + offsetPx[0];
    const y = ((1 - v.current.y) / 2) * size.height + offsetPx[1];
    el.style.transform = `translate(${x.toFixed(1)}px, ${y.toFixed(1)}px) translate(-50%, 0)`;
  });

  return <group ref={anchor} />;
}
