import { HomeScreen } from '@/features/home/components/home-screen';

export default function Home() {
  return <HomeScreen />;
}
