import {
  KeyboardCode,
  pointerWithin,
  rectIntersection,
  type ClientRect,
  type CollisionDetection,
  type DroppableContainer,
  type KeyboardCoordinateGetter,
  type UniqueIdentifier,
} from '@dnd-kit/core'
import type { DropTarget } from './drop-targets'

type Kind = DropTarget['kind']
const kindOf = (c: DroppableContainer | undefined): Kind | undefined => (c?.data.current as DropTarget | undefined)?.kind
const centreX = (r: ClientRect) => r.left + r.width / 2

/**
 * Arrow keys step from drop target to drop target instead of by pixels: left and right along the
 * columns (or along the week strip), up to the strip's nearest day, down back to the columns.
 * The chosen target is remembered so collision detection names it even while a container scrolls.
 */
export function createKeyboardNavigation() {
  let target: UniqueIdentifier | null = null

  const coordinateGetter: KeyboardCoordinateGetter = (event, { context, currentCoordinates }) => {
    const { droppableContainers, droppableRects, collisionRect } = context
    if (!collisionRect) return undefined
    const currentId = target ?? context.over?.id ?? null
    const current = droppableContainers.get(currentId)
    const currentKind = kindOf(current) ?? 'column'
    const currentRect = (currentId !== null && droppableRects.get(currentId)) || collisionRect
    const row = (kind: Kind) =>
      droppableContainers
        .getEnabled()
        .filter((c) => kindOf(c) === kind && droppableRects.has(c.id))
        .sort((a, b) => droppableRects.get(a.id)!.left - droppableRects.get(b.id)!.left)
    const nearest = (kind: Kind) =>
      row(kind).reduce<DroppableContainer | undefined>((best, c) => {
        const d = Math.abs(centreX(droppableRects.get(c.id)!) - centreX(currentRect))
        return !best || d < Math.abs(centreX(droppableRects.get(best.id)!) - centreX(currentRect)) ? c : best
      }, undefined)
    const step = (delta: 1 | -1) => {
      const items = row(currentKind)
      const index = items.findIndex((c) => c.id === currentId)
      if (index === -1)
        return delta === 1
          ? items.find((c) => droppableRects.get(c.id)!.left > currentRect.left)
          : items.findLast((c) => droppableRects.get(c.id)!.left < currentRect.left)
      return items[index + delta]
    }

    let next: DroppableContainer | undefined
    if (event.code === KeyboardCode.Right) next = step(1)
    else if (event.code === KeyboardCode.Left) next = step(-1)
    else if (event.code === KeyboardCode.Up) next = currentKind === 'column' ? nearest('day') : undefined
    else if (event.code === KeyboardCode.Down) next = currentKind === 'day' ? nearest('column') : undefined
    else return undefined
    // At an edge: stay put, but still swallow the key so the page does not scroll under the card.
    if (!next) return currentCoordinates
    target = next.id
    const rect = droppableRects.get(next.id)!
    return { x: rect.left + Math.max(0, (rect.width - collisionRect.width) / 2), y: rect.top + 4 }
  }

  const collisionDetection: CollisionDetection = (args) => {
    if (!args.pointerCoordinates) return target !== null ? [{ id: target }] : rectIntersection(args)
    return pointerWithin(args)
  }

  return {
    coordinateGetter,
    collisionDetection,
    start: (id: UniqueIdentifier | null) => {
      target = id
    },
  }
}
