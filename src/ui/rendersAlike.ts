// Whether two pieces of JSX draw the same thing, without drawing them: the details band (CalcScreen)
// uses it to leave a card alone when a re-render of the screen made it anew from the same data, and
// memoAlike to skip the fields a key did not touch.
import { Component, h, type ComponentType, type FunctionComponent } from 'preact';

/** Deeper than any card's props; a structure this deep is treated as changed, never walked further. */
const MAX_DEPTH = 200;

/** A Preact vnode: made by JSX, marked by an own `constructor` that is undefined. */
function isVNode(x: object): x is { type: unknown; key: unknown; ref: unknown; props: unknown } {
  return 'type' in x && 'props' in x && Object.prototype.hasOwnProperty.call(x, 'constructor') && (x as { constructor: unknown }).constructor === undefined;
}

/**
 * A function component marked `drawsFromPropsAlone = true` promises that calling it outside a render is safe and
 * gives what it draws: no hooks, no context, nothing read but its props.
 */
type DrawsFromPropsAlone = ((props: unknown) => unknown) & { drawsFromPropsAlone?: boolean };

/**
 * True when `a` and `b` render alike: the same vnode, or vnodes of the same type, key and ref whose props
 * are equal in depth (numbers by `Object.is`, so NaN equals NaN; arrays, typed arrays and plain objects by
 * their entries). Functions, maps, class instances and anything else count as alike only when they are the
 * very same object: a handler made anew may hold new state, so it is never assumed equal (a component marked
 * `drawsFromPropsAlone` is instead compared by what it draws). A false answer only costs a re-render; a true
 * one must never hide a change.
 */
export function rendersAlike(a: unknown, b: unknown, depth = 0): boolean {
  if (Object.is(a, b)) return true;
  if (typeof a !== 'object' || typeof b !== 'object' || a === null || b === null || depth > MAX_DEPTH) return false;
  if (Array.isArray(a) || Array.isArray(b) || ArrayBuffer.isView(a) || ArrayBuffer.isView(b)) {
    const x = a as ArrayLike<unknown>;
    const y = b as ArrayLike<unknown>;
    if (Object.getPrototypeOf(a) !== Object.getPrototypeOf(b) || x.length !== y.length) return false;
    for (let i = 0; i < x.length; i++) if (!rendersAlike(x[i], y[i], depth + 1)) return false;
    return true;
  }
  if (isVNode(a) || isVNode(b)) {
    if (!isVNode(a) || !isVNode(b)) return false;
    if (a.type !== b.type || a.key !== b.key || a.ref !== b.ref) return false;
    if (rendersAlike(a.props, b.props, depth + 1)) return true;
    // A component that draws from its props alone is compared by what it draws: a table's cell functions,
    // made anew on every render of the screen, are then alike when they draw the same rows the same way.
    const type = a.type as DrawsFromPropsAlone;
    return typeof type === 'function' && type.drawsFromPropsAlone === true && rendersAlike(type(a.props), type(b.props), depth + 1);
  }
  const proto = Object.getPrototypeOf(a);
  if (proto !== Object.getPrototypeOf(b) || (proto !== Object.prototype && proto !== null)) return false;
  const keys = Object.keys(a);
  if (keys.length !== Object.keys(b).length) return false;
  for (const k of keys) {
    if (!Object.prototype.hasOwnProperty.call(b, k) || !rendersAlike((a as Record<string, unknown>)[k], (b as Record<string, unknown>)[k], depth + 1)) return false;
  }
  return true;
}

/**
 * `component`, re-rendered by its parent only when its props no longer render alike (see above). For the
 * fields of an inputs band: a key typed in one field re-renders the screen, and the other fields, given
 * props equal to the last ones, are skipped. The component's own state still re-renders it as usual.
 */
export function memoAlike<P extends object>(component: FunctionComponent<P>): ComponentType<P> {
  class Alike extends Component<P> {
    override shouldComponentUpdate(next: P): boolean {
      return !rendersAlike(this.props, next);
    }
    render(props: P) {
      return h(component, props);
    }
  }
  (Alike as unknown as { displayName: string }).displayName = `Alike(${component.displayName ?? component.name})`;
  return Alike;
}
