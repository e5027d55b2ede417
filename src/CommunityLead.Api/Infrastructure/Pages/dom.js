// Building elements from data without innerHTML, so a name or a lab's cell can never become markup.
export function el(tag, attributes = {}, ...children) {
  const node = document.createElement(tag);
  for (const [name, value] of Object.entries(attributes)) {
    if (value === undefined || value === null || value === false) continue;
    if (name === 'class') node.className = value;
    else if (name.startsWith('on')) node.addEventListener(name.slice(2), value);
    else node.setAttribute(name, value === true ? '' : value);
  }
  for (const child of children.flat(Infinity)) {
    if (child === undefined || child === null || child === false) continue;
    node.append(child instanceof Node ? child : document.createTextNode(String(child)));
  }
  return node;
}

/** Writes a message into a status element (an aria-live region on the page), marked ok, error or warn. */
export function say(target, text, kind = 'ok') {
  target.className = `status ${kind}`;
  target.textContent = text;
}

export function byId(id) { return document.getElementById(id); }
