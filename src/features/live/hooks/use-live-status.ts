import { createContext, useContext } from 'react'

export type LiveStatus = 'signed-out' | 'connecting' | 'live' | 'reconnecting' | 'offline'

export const LiveStatusContext = createContext<LiveStatus>('signed-out')

export const useLiveStatus = () => useContext(LiveStatusContext)
